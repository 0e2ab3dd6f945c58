import type { EngineRequest } from '../contract/schema';
import { EngineError } from '../errors';
import { SCHEMES } from '../schemes/registry';
import { STATISTICS } from '../statistics/registry';
import type { StatisticData } from '../statistics/types';
import { LIMITS } from './limits';
import type { Problem } from './problem';

/**
 * Turns a parsed request into a Problem: reads the columns the statistic and the scheme
 * need, leaves out rows with missing or non-finite values (counted for a warning), checks
 * sizes and limits, and prepares the statistic (presorting etc.) and the scheme.
 * Throws EngineError naming the field for anything it cannot use.
 */
export function prepareProblem(request: EngineRequest): Problem {
  const statisticDef = STATISTICS.get(request.statistic.name)!;
  const schemeDef = SCHEMES.get(request.scheme.name)!;
  const settings = request.statistic;
  const data = request.data as Record<string, unknown[]>;

  const numeric = statisticDef.numericColumns(settings);
  const group = statisticDef.groupColumn?.(settings);
  const labelNeeds = schemeDef.labelColumns(request.scheme);

  const requireColumn = (column: string, path: string): unknown[] => {
    const col = data[column];
    if (!Object.prototype.hasOwnProperty.call(data, column) || !Array.isArray(col)) {
      const names = Object.keys(data);
      throw new EngineError('invalid:request', `there is no column "${column}" in data${names.length ? ` (columns: ${names.join(', ')})` : ''}`, path);
    }
    if (col.length === 0) throw new EngineError('invalid:data', `column "${column}" is empty`, `data.${column}`);
    return col;
  };

  const used = [...numeric.map((c) => ({ ...c, kind: 'numeric' as const })), ...(group ? [{ column: group.column, path: group.path, kind: 'label' as const }] : []), ...labelNeeds.map((c) => ({ ...c, kind: 'label' as const }))];
  let rowCount = -1;
  let first = '';
  for (const u of used) {
    const col = requireColumn(u.column, u.path);
    if (rowCount < 0) {
      rowCount = col.length;
      first = u.column;
    } else if (col.length !== rowCount) {
      throw new EngineError('invalid:data', `column "${u.column}" has ${col.length} values but "${first}" has ${rowCount}; columns must have one value per row`, `data.${u.column}`);
    }
  }

  // Read cells: numbers (non-finite = missing), labels (null = missing); text in a numeric column is an error.
  const missing = new Uint8Array(rowCount);
  const missingIn = new Set<string>();
  const numericValues = new Map<string, Float64Array>();
  for (const c of numeric) {
    if (numericValues.has(c.column)) continue;
    const col = data[c.column];
    const out = new Float64Array(rowCount);
    for (let r = 0; r < rowCount; r++) {
      const v = col[r];
      if (typeof v === 'number') {
        out[r] = v;
        if (!Number.isFinite(v)) {
          missing[r] = 1;
          missingIn.add(c.column);
        }
      } else if (v === null || v === undefined) {
        out[r] = Number.NaN;
        missing[r] = 1;
        missingIn.add(c.column);
      } else {
        throw new EngineError('invalid:data', `data.${c.column}[${r}] is ${typeof v === 'string' ? `the text ${JSON.stringify(v)}` : String(v)}; column "${c.column}" must hold numbers (null for a missing value)`, `data.${c.column}[${r}]`);
      }
    }
    numericValues.set(c.column, out);
  }
  const labelValues = new Map<string, (string | null)[]>();
  for (const c of [...(group ? [group] : []), ...labelNeeds]) {
    if (labelValues.has(c.column)) continue;
    const col = data[c.column];
    const out = new Array<string | null>(rowCount);
    for (let r = 0; r < rowCount; r++) {
      const v = col[r];
      if (v === null || v === undefined || (typeof v === 'number' && !Number.isFinite(v))) {
        out[r] = null;
        missing[r] = 1;
        missingIn.add(c.column);
      } else if (typeof v === 'string' || typeof v === 'number' || typeof v === 'boolean') out[r] = String(v);
      else throw new EngineError('invalid:data', `data.${c.column}[${r}] must be a text label, a number or null`, `data.${c.column}[${r}]`);
    }
    labelValues.set(c.column, out);
  }

  // Rows used: complete rows (and, for two-group statistics, rows in one of the two levels).
  const keep: number[] = [];
  let dropped = 0;
  const groupOf: number[] = [];
  const groupLabels = group ? labelValues.get(group.column)! : null;
  for (let r = 0; r < rowCount; r++) {
    if (groupLabels) {
      const g = groupLabels[r];
      const k = g === null ? -2 : group!.levels.indexOf(g);
      if (k === -1) continue; // another level: not part of this comparison
      if (missing[r]) {
        dropped++;
        continue;
      }
      groupOf.push(k);
    } else if (missing[r]) {
      dropped++;
      continue;
    }
    keep.push(r);
  }
  const rows = Int32Array.from(keep);
  const n = rows.length;

  let groupSizes: [number, number] | null = null;
  if (group) {
    const sizes: [number, number] = [0, 0];
    for (const g of groupOf) sizes[g]++;
    for (let k = 0; k < 2; k++) {
      if (sizes[k] < statisticDef.minUnits) {
        throw new EngineError(
          'invalid:data',
          sizes[k] === 0
            ? `no rows with complete values have ${group.column} = "${group.levels[k]}"`
            : `group "${group.levels[k]}" has ${sizes[k]} value${sizes[k] === 1 ? '' : 's'}; each group needs at least ${statisticDef.minUnits}`,
          `${group.levelsPath}[${k}]`,
        );
      }
    }
    groupSizes = sizes;
  } else if (n < statisticDef.minUnits) {
    const c = numeric[0];
    throw new EngineError(
      'invalid:data',
      `the ${statisticDef.describe(settings)} needs at least ${statisticDef.minUnits} rows with finite values; found ${n}`,
      `data.${c.column}`,
    );
  }

  if (n > LIMITS.maxN) throw new EngineError('limit:n', `at most ${LIMITS.maxN.toLocaleString('en-US')} rows can be resampled; this request has ${n.toLocaleString('en-US')}`, 'data');
  checkWork(request, n);

  const values: Record<string, Float64Array> = {};
  for (const c of numeric) {
    const all = numericValues.get(c.column)!;
    const v = new Float64Array(n);
    for (let i = 0; i < n; i++) v[i] = all[rows[i]];
    values[c.role] = v;
  }
  const statData: StatisticData = { n, values, group: group ? Int32Array.from(groupOf) : undefined };
  const columnOfRole = new Map(numeric.map((c) => [c.role, c.column]));
  statisticDef.validate?.(statData, settings, (role, unit) => `data.${columnOfRole.get(role) ?? role}[${rows[unit]}]`);

  const statistic = statisticDef.prepare(statData, settings);
  if (!Number.isFinite(statistic.estimate)) {
    throw new EngineError('invalid:data', `the ${statisticDef.describe(settings)} is undefined for these data (for example no spread, or a zero mean)`, 'statistic');
  }

  const m = request.intervals.methods;
  const needsJackknife = m.includes('bca') || request.include.includes('jackknife') || (m.includes('studentized') && request.intervals.studentized.se === 'jackknife');
  if (needsJackknife && !statistic.leaveOneOut && n * n > LIMITS.maxJackknifeSteps) {
    throw new EngineError(
      'limit:work',
      `the jackknife (needed for BCa, the studentized interval and the jackknife output) would evaluate the ${statisticDef.describe(settings)} ${n.toLocaleString('en-US')} times on ${n.toLocaleString('en-US')} rows, above the limit; choose the percentile, basic or normal interval`,
      m.includes('bca') || m.includes('studentized') ? 'intervals.methods' : 'include',
    );
  }

  const scheme = schemeDef.prepare(
    {
      statistic,
      n,
      labels: (column) => {
        const all = labelValues.get(column);
        if (!all) throw new EngineError('invalid:request', `column "${column}" was not read`, 'scheme');
        return Array.from(rows, (r) => all[r]!);
      },
      data: statData,
      evaluate: (d) => statisticDef.prepare(d, settings).estimate,
      statisticName: statisticDef.name,
      columnOf: (role) => columnOfRole.get(role) ?? role,
      rowOf: (unit) => rows[unit],
      groupLevels: group?.levels,
    },
    request.scheme,
  );

  const strata = scheme.counting?.strata ?? (statData.group ? splitByGroup(statData.group) : [Int32Array.from({ length: n }, (_, i) => i)]);
  return {
    request,
    statisticDef,
    schemeDef,
    statistic,
    scheme,
    data: statData,
    n,
    rows,
    dropped,
    droppedColumns: [...missingIn],
    strata,
    groupSizes,
    groupLevels: group?.levels ?? null,
    columnOf: (role) => columnOfRole.get(role) ?? role,
    usedColumns: used.map((u) => u.column),
    description: statisticDef.describe(settings),
  };
}

function splitByGroup(group: Int32Array): Int32Array[] {
  const a: number[] = [];
  const b: number[] = [];
  group.forEach((g, i) => (g === 0 ? a : b).push(i));
  return [Int32Array.from(a), Int32Array.from(b)];
}

/** Limits on B and on the number of index draws, before any work is done. */
function checkWork(request: EngineRequest, n: number): void {
  const B = request.B;
  if (B > LIMITS.maxB) throw new EngineError('limit:B', `B = ${B.toLocaleString('en-US')} is above the limit of ${LIMITS.maxB.toLocaleString('en-US')} replicates`, 'B');
  const stud = request.intervals.methods.includes('studentized') ? request.intervals.studentized : null;
  const inner = stud ? (stud.se === 'bootstrap' ? stud.innerB : n) : 0;
  const draws = n * B * (1 + inner);
  if (draws > LIMITS.maxDraws) {
    const what = stud ? `n·B·(1 + inner work) = ${fmt(draws)} (the studentized interval's inner ${stud.se === 'bootstrap' ? `bootstrap of ${stud.innerB} replicates` : 'jackknife'} on every replicate)` : `n·B = ${fmt(draws)} index draws`;
    throw new EngineError('limit:work', `this request needs ${what}, above the limit of ${fmt(LIMITS.maxDraws)}; lower B${stud ? ' or choose another interval' : ''}`, stud ? 'intervals.methods' : 'B');
  }
}

function fmt(x: number): string {
  return x >= 1e6 ? x.toExponential(2).replace('e+', '×10^') : x.toLocaleString('en-US');
}
