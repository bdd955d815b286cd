/**
 * Keeps the tally for scripts/test.sh: one line per step in a ledger file, then a closing report.
 *
 *   node --import tsx scripts/test-summary.ts record <ledger> <step> <exit-code> [vitest-json-file]
 *   node --import tsx scripts/test-summary.ts report <ledger>
 *
 * A step without a JSON report (typecheck, lint, build) counts as one check: passed when it exited 0.
 * A vitest step counts its tests; a file that failed to load, a runner that exited non-zero with no failed
 * test, or test files that ran no test at all each count as a failure. A step with no test files yet is
 * noted and counts nothing. `report` prints `Summary: N passed, N failed` and exits 1 when anything failed
 * or when nothing was counted at all.
 */
import { appendFileSync, existsSync, readFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';

/** The part of vitest's JSON reporter output that the tally reads. */
export interface VitestJsonReport {
  numPassedTests: number;
  numFailedTests: number;
  numPendingTests: number;
  numTotalTests: number;
  testResults: { name: string; status: string; message?: string; assertionResults: { status: string }[] }[];
}

/** One step's counts as stored in the ledger. */
export interface StepResult {
  step: string;
  passed: number;
  failed: number;
  skipped: number;
  note: string;
}

/** Reads a vitest JSON report, or `undefined` when it is missing or unreadable. */
function readVitestReport(file: string | undefined): VitestJsonReport | undefined {
  if (!file || !existsSync(file)) return undefined;
  try {
    return JSON.parse(readFileSync(file, 'utf8')) as VitestJsonReport;
  } catch {
    return undefined;
  }
}

/** Turns one step's exit code and optional vitest report into counts. */
export function countStep(step: string, exitCode: number, report: VitestJsonReport | undefined, expectsReport: boolean): StepResult {
  if (!expectsReport) {
    return exitCode === 0
      ? { step, passed: 1, failed: 0, skipped: 0, note: 'ok' }
      : { step, passed: 0, failed: 1, skipped: 0, note: `exited ${exitCode}` };
  }
  if (!report) {
    return { step, passed: 0, failed: 1, skipped: 0, note: `no test report (runner exited ${exitCode})` };
  }
  const files = report.testResults.length;
  const skipped = report.numPendingTests;
  let failed = report.numFailedTests;
  const notes: string[] = [];
  // A file that throws while loading, or whose beforeAll throws, fails with no failed test of its own.
  const brokenFiles = report.testResults.filter(
    (file) => file.status === 'failed' && !file.assertionResults.some((test) => test.status === 'failed'),
  ).length;
  if (brokenFiles > 0) {
    failed += brokenFiles;
    notes.push(`${brokenFiles} file(s) failed outside a test (loading or a hook)`);
  }
  if (files === 0) {
    if (exitCode !== 0) return { step, passed: 0, failed: 1, skipped: 0, note: `runner exited ${exitCode}` };
    return { step, passed: 0, failed: 0, skipped: 0, note: 'no test files yet' };
  }
  if (report.numTotalTests === 0 && brokenFiles === 0) {
    failed += 1;
    notes.push(`${files} test file(s) ran no test`);
  }
  if (exitCode !== 0 && failed === 0) {
    failed = 1;
    notes.push(`runner exited ${exitCode} with no failed test (see its log)`);
  }
  return { step, passed: report.numPassedTests, failed, skipped, note: notes.join('; ') || `${files} file(s)` };
}

function record(ledger: string, step: string, exitCodeText: string, jsonFile: string | undefined): void {
  const exitCode = Number(exitCodeText);
  const result = countStep(step, exitCode, readVitestReport(jsonFile), jsonFile !== undefined);
  appendFileSync(ledger, `${JSON.stringify(result)}\n`);
  const verdict = result.failed > 0 ? 'FAILED' : 'ok';
  console.log(`[test] ${step}: ${verdict} (${result.passed} passed, ${result.failed} failed, ${result.skipped} skipped; ${result.note})`);
}

function report(ledger: string): void {
  const results: StepResult[] = existsSync(ledger)
    ? readFileSync(ledger, 'utf8')
        .split('\n')
        .filter((line) => line.trim() !== '')
        .map((line) => JSON.parse(line) as StepResult)
    : [];
  const width = Math.max(4, ...results.map((result) => result.step.length));
  console.log('');
  console.log(`${'step'.padEnd(width)}  passed  failed  skipped  note`);
  for (const result of results) {
    console.log(
      `${result.step.padEnd(width)}  ${String(result.passed).padStart(6)}  ${String(result.failed).padStart(6)}  ${String(result.skipped).padStart(7)}  ${result.note}`,
    );
  }
  const passed = results.reduce((sum, result) => sum + result.passed, 0);
  const failed = results.reduce((sum, result) => sum + result.failed, 0);
  const skipped = results.reduce((sum, result) => sum + result.skipped, 0);
  console.log('');
  console.log(`Summary: ${passed} passed, ${failed} failed${skipped > 0 ? `, ${skipped} skipped` : ''}`);
  if (passed + failed === 0) console.log('[test] nothing was counted: treating the run as failed');
  process.exitCode = failed > 0 || passed + failed === 0 ? 1 : 0;
}

/** Whether this file was started as a program (not imported by its spec). */
const isMain = process.argv[1] !== undefined && import.meta.url === pathToFileURL(process.argv[1]).href;

if (isMain) {
  const [command, ledger, ...rest] = process.argv.slice(2);
  if (command === 'record' && ledger && rest.length >= 2) {
    record(ledger, rest[0], rest[1], rest[2]);
  } else if (command === 'report' && ledger) {
    report(ledger);
  } else {
    console.error('Usage: test-summary.ts record <ledger> <step> <exit-code> [vitest-json] | report <ledger>');
    process.exitCode = 2;
  }
}
