import { EngineError, formatPath } from '../errors';
import { PLANNED_SCHEMES, SCHEMES, schemeNames } from '../schemes/registry';
import { STATISTICS, statisticNames } from '../statistics/registry';
import { TEST_NAMES } from '../hypothesis/test-schema';
import { type EngineRequest, engineRequestSchema } from './schema';

/**
 * Validates a request and returns it with defaults filled in. Throws EngineError naming
 * the field: `invalid:request` for a malformed field, `unsupported:scheme`
 * for parts of the contract this engine version does not run yet.
 */
export function parseRequest(input: unknown): EngineRequest {
  if (input === null || typeof input !== 'object' || Array.isArray(input)) {
    throw new EngineError('invalid:request', 'the request must be a JSON object with data, statistic, B, …', '');
  }
  const raw = input as Record<string, unknown>;
  checkName(raw.statistic, 'statistic', STATISTICS, statisticNames(), [], true);
  checkName(raw.scheme, 'scheme', SCHEMES, schemeNames(), PLANNED_SCHEMES, false);
  if (raw.test !== undefined) checkName(raw.test, 'test', new Map(TEST_NAMES.map((t) => [t, t])), [...TEST_NAMES], [], true);
  const parsed = engineRequestSchema.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const path = formatPath(issue.path);
    const last = issue.path.length ? String(issue.path[issue.path.length - 1]) : '';
    const message = path && !issue.message.includes(last) ? `${path}: ${issue.message}` : issue.message;
    throw new EngineError('invalid:request', message, path);
  }
  return parsed.data;
}

function checkName(value: unknown, field: string, known: ReadonlyMap<string, unknown>, names: string[], planned: readonly string[], required: boolean): void {
  if (value === undefined && !required) return;
  if (value === null || typeof value !== 'object' || Array.isArray(value)) {
    throw new EngineError('invalid:request', `${field} must be an object with a name, e.g. { "name": "${names[0]}" }`, field);
  }
  const name = (value as { name?: unknown }).name;
  if (typeof name !== 'string') throw new EngineError('invalid:request', `${field}.name must be one of ${names.join(', ')}`, `${field}.name`);
  if (known.has(name)) return;
  if (planned.includes(name)) {
    throw new EngineError(`unsupported:${field}`, `the ${name} ${field} is not available in this engine version yet; use one of ${names.join(', ')}`, `${field}.name`);
  }
  throw new EngineError('invalid:request', `unknown ${field} "${name}"; use one of ${names.join(', ')}`, `${field}.name`);
}
