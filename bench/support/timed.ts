// Whole-process timing for the benchmarks (bench/run.ts, bench/structured.ts): each program is
// started fresh and timed from spawn to exit, with GNU time's maximum resident set size when
// /usr/bin/time is there.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

export interface Run {
  seconds: number;
  rssMB: number | null;
  out: string;
}

const hasTime = existsSync('/usr/bin/time');

/**
 * Settings this workplace's sandbox adds to every process and a plain Debian machine does not
 * have, each of which changes one program's speed and no other's:
 * - NODE_EXTRA_CA_CERTS (the system certificate bundle again): every Node process reads and
 *   parses it at start-up, ~40 ms here, before any of its own code runs — npm's process and the
 *   engine's alike, neither of which opens a TLS connection;
 * - OPENBLAS_CORETYPE / OPENBLAS_L2_SIZE: force OpenBLAS's kernel choice (numpy, under SciPy).
 * The benchmarks run every program without them; bench/run.ts also times Margin with the
 * environment as it is, and prints both.
 */
export const SANDBOX_OVERRIDES = ['NODE_EXTRA_CA_CERTS', 'OPENBLAS_CORETYPE', 'OPENBLAS_L2_SIZE'] as const;

/** process.env without SANDBOX_OVERRIDES; the names it removed. */
export function benchEnv(): { env: NodeJS.ProcessEnv; removed: string[] } {
  const env = { ...process.env };
  const removed = SANDBOX_OVERRIDES.filter((k) => k in env);
  for (const k of removed) delete env[k];
  return { env, removed };
}

/** Runs cmd once, from spawn to exit; throws with its stderr when it fails. */
export function timed(cmd: string, args: string[], opts: { cwd: string; env?: NodeJS.ProcessEnv }): Run {
  const [file, argv]: [string, string[]] = hasTime ? ['/usr/bin/time', ['-f', '__TIME__ %e %M', cmd, ...args]] : [cmd, args];
  const t0 = performance.now();
  const r = spawnSync(file, argv, { cwd: opts.cwd, env: opts.env ?? process.env, encoding: 'utf8', maxBuffer: 256 * 1024 * 1024 });
  const seconds = (performance.now() - t0) / 1000;
  if (r.status !== 0) throw new Error(`${cmd} ${args.join(' ')} failed (${r.status}): ${(r.stderr ?? '').slice(-2000)}`);
  const m = /__TIME__ ([\d.]+) (\d+)/.exec(r.stderr ?? '');
  return { seconds, rssMB: m ? Number(m[2]) / 1024 : null, out: r.stdout.trim() };
}

export function median(v: number[]): number {
  const s = [...v].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
}

/** Largest peak RSS among runs that report one. */
export function peakRss(runs: Run[]): number | null {
  const rss = runs.map((r) => r.rssMB).filter((v): v is number => v !== null);
  return rss.length ? Math.max(...rss) : null;
}
