import { execFileSync, spawnSync } from 'node:child_process';
import path from 'node:path';

/** True when Rscript with the boot package is installed (scripts/ensure-system.sh r installs it). */
export const hasR = spawnSync('Rscript', ['-e', 'quit(status = !requireNamespace("boot", quietly = TRUE))'], { encoding: 'utf8' }).status === 0;

const here = path.join(process.cwd(), 'tests', 'reference', 'r');

/** Runs tests/reference/r/SCRIPT with args; returns stdout. */
export function rscript(script: string, args: string[] = []): string {
  return execFileSync('Rscript', [path.join(here, script), ...args], { encoding: 'utf8', maxBuffer: 256 * 1024 * 1024 });
}

/** Parses `key value` lines. */
export function keyValues(text: string): Record<string, number> {
  const out: Record<string, number> = {};
  for (const line of text.split('\n')) {
    const [k, v] = line.trim().split(/\s+/);
    if (k && v !== undefined) out[k] = v === 'NA' ? Number.NaN : Number(v);
  }
  return out;
}

/** A data set from R's `datasets` package, by column (numbers, null for NA, or labels). */
export function rDataset(name: string): Record<string, (number | null)[] | string[]> {
  const out: Record<string, (number | null)[] | string[]> = {};
  for (const line of rscript('dataset.R', [name]).split('\n')) {
    if (!line) continue;
    const [col, ...values] = line.split('\t');
    const numeric = values.every((v) => v === 'NA' || !Number.isNaN(Number(v)));
    out[col] = numeric ? values.map((v) => (v === 'NA' ? null : Number(v))) : values;
  }
  return out;
}
