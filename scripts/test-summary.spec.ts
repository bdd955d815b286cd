import { describe, expect, it } from 'vitest';
import { countStep, type VitestJsonReport } from './test-summary';

function vitestReport(overrides: Partial<VitestJsonReport>): VitestJsonReport {
  return {
    numPassedTests: 0,
    numFailedTests: 0,
    numPendingTests: 0,
    numTotalTests: 0,
    testResults: [],
    ...overrides,
  };
}

describe('countStep', () => {
  it('counts a step without a report as one check', () => {
    expect(countStep('typecheck', 0, undefined, false)).toMatchObject({ passed: 1, failed: 0 });
    expect(countStep('lint', 1, undefined, false)).toMatchObject({ passed: 0, failed: 1 });
  });

  it('counts the tests of a vitest report', () => {
    const report = vitestReport({
      numPassedTests: 7,
      numFailedTests: 2,
      numPendingTests: 1,
      numTotalTests: 10,
      testResults: [{ name: 'a.spec.ts', status: 'failed', assertionResults: [{ status: 'passed' }, { status: 'failed' }] }],
    });
    expect(countStep('unit', 1, report, true)).toMatchObject({ passed: 7, failed: 2, skipped: 1 });
  });

  it('counts a file that failed to load as a failure', () => {
    const report = vitestReport({
      numPassedTests: 3,
      numTotalTests: 3,
      testResults: [
        { name: 'a.spec.ts', status: 'passed', assertionResults: [{ status: 'passed' }, { status: 'passed' }, { status: 'passed' }] },
        { name: 'b.spec.ts', status: 'failed', message: 'SyntaxError', assertionResults: [] },
      ],
    });
    expect(countStep('unit', 1, report, true)).toMatchObject({ passed: 3, failed: 1 });
  });

  it('counts a file whose hook failed, skipping its tests, as a failure', () => {
    const report = vitestReport({
      numPendingTests: 2,
      numTotalTests: 2,
      testResults: [{ name: 'a.test.ts', status: 'failed', assertionResults: [{ status: 'skipped' }, { status: 'skipped' }] }],
    });
    expect(countStep('integration', 1, report, true)).toMatchObject({ passed: 0, failed: 1, skipped: 2 });
  });

  it('counts test files that ran no test as a failure', () => {
    const report = vitestReport({ testResults: [{ name: 'a.spec.ts', status: 'passed', assertionResults: [] }] });
    expect(countStep('unit', 0, report, true).failed).toBe(1);
  });

  it('does not fail a step that has no test files yet', () => {
    expect(countStep('browser', 0, vitestReport({}), true)).toMatchObject({ passed: 0, failed: 0, note: 'no test files yet' });
  });

  it('fails a runner that exited non-zero without a report or a failed test', () => {
    expect(countStep('integration', 1, undefined, true).failed).toBe(1);
    const report = vitestReport({
      numPassedTests: 1,
      numTotalTests: 1,
      testResults: [{ name: 'a.test.ts', status: 'passed', assertionResults: [{ status: 'passed' }] }],
    });
    expect(countStep('integration', 1, report, true).failed).toBe(1);
  });
});
