// Test support for the structured-data reference checks: runs a short R program with
// Debian's Rscript (r-base-core + r-cran-boot) and reads back numbers it prints.
// Tests call R live rather than pasting its output, so a change on either side shows up.
import { execFileSync } from 'node:child_process';

/** Runs `Rscript -e code` and returns its standard output (throws if R fails). */
export function runR(code: string): string {
  return execFileSync('Rscript', ['--vanilla', '-e', code], {
    encoding: 'utf8',
    stdio: ['ignore', 'pipe', 'pipe'],
    maxBuffer: 64 * 1024 * 1024,
  });
}

/**
 * Runs R code that prints `name: v1 v2 ...` lines (use `emit()` below) and returns them
 * as a map of number arrays. Values are printed with 17 significant digits so that doubles
 * survive the trip exactly.
 */
export function runRNumbers(code: string): Record<string, number[]> {
  const prelude = 'emit <- function(name, x) cat(name, ":", sprintf("%.17g", as.numeric(x)), "\\n");\n';
  const out = runR(prelude + code);
  const result: Record<string, number[]> = {};
  for (const line of out.split('\n')) {
    const m = /^(\S+) :(.*)$/.exec(line.trim());
    if (!m) continue;
    result[m[1]] = m[2].trim() === '' ? [] : m[2].trim().split(/\s+/).map(Number);
  }
  return result;
}

/** Whether Rscript can be started here (CI installs it in its set-up). */
export function hasR(): boolean {
  try {
    runR('cat(1)');
    return true;
  } catch {
    return false;
  }
}
