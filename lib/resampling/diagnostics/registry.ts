import type { Warning } from '../contract/response';
import { degenerateReplicates } from './degenerate-replicates';
import { dependentJackknife } from './dependent-jackknife';
import { droppedValues } from './dropped-values';
import { extremeStatistic } from './extreme-statistic';
import { heavyTies } from './heavy-ties';
import { intervalNotes } from './interval-notes';
import { nonSmoothJackknife } from './non-smooth-jackknife';
import { regressionDesign } from './regression-design';
import { repeatedIdColumns } from './repeated-ids';
import { replicateOutliers } from './replicate-outliers';
import { serialCorrelation } from './serial-correlation';
import { skewedReplicates } from './skewed-replicates';
import { smallB } from './small-b';
import { smallSample } from './small-sample';
import type { Diagnostic, DiagnosticContext } from './types';
import { undefinedReplicates } from './undefined-replicates';
import { zeroVarianceGroup } from './zero-variance-group';

/** Every diagnostic, in the order its warning is listed. */
export const DIAGNOSTICS: readonly Diagnostic[] = [
  droppedValues,
  smallSample,
  serialCorrelation,
  repeatedIdColumns,
  zeroVarianceGroup,
  regressionDesign,
  heavyTies,
  extremeStatistic,
  undefinedReplicates,
  degenerateReplicates,
  smallB,
  skewedReplicates,
  replicateOutliers,
  nonSmoothJackknife,
  dependentJackknife,
  intervalNotes,
];

export function diagnose(ctx: DiagnosticContext): Warning[] {
  const out: Warning[] = [];
  for (const d of DIAGNOSTICS) {
    const w = d(ctx);
    if (w) out.push(w);
  }
  return out;
}
