// Prints one closing line over all Vitest JSON reports: "ringdown: N passed, N failed, N skipped".
import { readFileSync } from 'node:fs'

let passed = 0
let failed = 0
let skipped = 0
for (const file of process.argv.slice(2)) {
  const report = JSON.parse(readFileSync(file, 'utf8'))
  passed += report.numPassedTests
  failed += report.numFailedTests
  skipped += report.numPendingTests + (report.numTodoTests ?? 0)
}
console.log(`ringdown: ${passed} passed, ${failed} failed, ${skipped} skipped`)
