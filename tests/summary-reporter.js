// Prints one plain closing line, "jest: N passed, N failed[, N skipped]", after jest's own summary.
class SummaryReporter {
  onRunComplete(_contexts, results) {
    const skipped = results.numPendingTests + results.numTodoTests;
    const line = `jest: ${results.numPassedTests} passed, ${results.numFailedTests} failed${skipped ? `, ${skipped} skipped` : ''}`;
    process.stdout.write(`${line}\n`);
  }
}
module.exports = SummaryReporter;
