/**
 * Prints one closing line that CI reads: "N passed, N failed" (", N skipped" when any were skipped).
 * Counts individual tests (assertion blocks), not files; a file that fails to load counts as one failure.
 */
class SummaryReporter {
  onRunComplete(_contexts, results) {
    const failedSuites = results.testResults.filter((r) => r.testExecError).length;
    const passed = results.numPassedTests;
    const failed = results.numFailedTests + failedSuites;
    const skipped = results.numPendingTests + results.numTodoTests;
    const tail = skipped > 0 ? `, ${skipped} skipped` : "";
    // Written at exit so it comes after jest's own summary and is the last line of the run.
    process.once("exit", () => process.stdout.write(`\n${passed} passed, ${failed} failed${tail}\n`));
  }
}
module.exports = SummaryReporter;
