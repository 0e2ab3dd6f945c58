import 'server-only';
import { estimateCompute } from '../estimate/compute';

/**
 * The convergence trace is part of every Estimate run, so a Convergence plot asks for
 * exactly the Estimate's run: same kind, same key, one computation for both blocks.
 */
export const convergenceCompute = estimateCompute;
