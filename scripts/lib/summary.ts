import { existsSync, readFileSync } from 'node:fs';
import { formatDuration } from './timing';

export interface PhaseResult {
  name: string;
  ms: number;
  passed: number;
  failed: number;
  /** Why the phase counts as failed beyond its test results (a crash, a set-up error). */
  note?: string;
  /** A set-up step, not a test run: shown as ok/failed instead of counts. */
  setup?: boolean;
}

interface JsonReport {
  numPassedTests: number;
  numFailedTests: number;
  testResults: { status: string; message?: string; assertionResults: { status: string }[] }[];
}

function isReport(value: unknown): value is JsonReport {
  const report = value as Partial<JsonReport> | null;
  return typeof report?.numPassedTests === 'number' && typeof report.numFailedTests === 'number' && Array.isArray(report.testResults);
}

/**
 * Counts a vitest run from its JSON report and exit code. A test file that failed to load counts
 * as one failure; a non-zero exit with nothing failed (a crash, a global set-up error, no test
 * files) counts as one; a missing or unreadable report counts as one.
 */
export function countVitestRun(reportFile: string, exitCode: number | null): { passed: number; failed: number; note?: string } {
  let report: unknown = null;
  if (existsSync(reportFile)) {
    try {
      report = JSON.parse(readFileSync(reportFile, 'utf8'));
    } catch {
      report = null;
    }
  }
  if (!isReport(report)) return { passed: 0, failed: 1, note: `no test report (vitest exit code ${exitCode ?? 'none'})` };
  const brokenFiles = report.testResults.filter(
    (file) => file.status === 'failed' && !file.assertionResults.some((test) => test.status === 'failed'),
  ).length;
  const failed = report.numFailedTests + brokenFiles;
  if (exitCode !== 0 && failed === 0)
    return { passed: report.numPassedTests, failed: 1, note: `vitest exited with code ${exitCode ?? 'none'}` };
  return { passed: report.numPassedTests, failed, ...(brokenFiles > 0 ? { note: `${brokenFiles} test file(s) failed to run` } : {}) };
}

/** Phase durations and counts, then the one summary line that must come last. */
export function formatSummary(phases: readonly PhaseResult[], totalMs: number): string[] {
  const width = Math.max(5, ...phases.map((phase) => phase.name.length));
  const lines = phases.map((phase) => {
    const outcome = phase.setup ? (phase.failed > 0 ? 'FAILED' : 'ok') : `${phase.passed} passed, ${phase.failed} failed`;
    return `  ${phase.name.padEnd(width)}  ${formatDuration(phase.ms).padStart(10)}  ${outcome}${phase.note ? `  (${phase.note})` : ''}`;
  });
  const passed = phases.reduce((sum, phase) => sum + phase.passed, 0);
  const failed = phases.reduce((sum, phase) => sum + phase.failed, 0);
  return ['Phases:', ...lines, `  ${'total'.padEnd(width)}  ${formatDuration(totalMs).padStart(10)}`, `${passed} passed, ${failed} failed`];
}
