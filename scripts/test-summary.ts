// Prints one closing line for the whole suite from vitest's JSON reports:
// "tests: N passed, N failed, N skipped".
import { existsSync, readFileSync } from 'node:fs';

let passed = 0;
let failed = 0;
let skipped = 0;
for (const file of process.argv.slice(2)) {
  if (!existsSync(file)) continue;
  const r = JSON.parse(readFileSync(file, 'utf8')) as { numPassedTests: number; numFailedTests: number; numPendingTests: number; numTodoTests: number };
  passed += r.numPassedTests;
  failed += r.numFailedTests;
  skipped += r.numPendingTests + r.numTodoTests;
}
console.log(`tests: ${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
