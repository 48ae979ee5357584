import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { countVitestRun, formatSummary } from './summary';

const dir = mkdtempSync(path.join(tmpdir(), 'pinfield-summary-'));

function report(name: string, body: unknown): string {
  const file = path.join(dir, name);
  writeFileSync(file, JSON.stringify(body));
  return file;
}

const file = (status: string, tests: string[]) => ({ status, assertionResults: tests.map((s) => ({ status: s })) });

describe('countVitestRun', () => {
  it('counts passed and failed tests from the JSON report', () => {
    const f = report('ok.json', { numPassedTests: 7, numFailedTests: 2, testResults: [file('failed', ['passed', 'failed', 'failed'])] });
    expect(countVitestRun(f, 1)).toEqual({ passed: 7, failed: 2 });
  });

  it('counts a test file that failed to load as one failure', () => {
    const f = report('broken.json', {
      numPassedTests: 3,
      numFailedTests: 0,
      testResults: [file('passed', ['passed']), file('failed', [])],
    });
    expect(countVitestRun(f, 1)).toEqual({ passed: 3, failed: 1, note: '1 test file(s) failed to run' });
  });

  it('counts a non-zero exit with nothing failed (a crashed global set-up) as one failure', () => {
    const f = report('crash.json', { numPassedTests: 5, numFailedTests: 0, testResults: [] });
    expect(countVitestRun(f, 1)).toEqual({ passed: 5, failed: 1, note: 'vitest exited with code 1' });
  });

  it('counts a missing or unreadable report as one failure', () => {
    expect(countVitestRun(path.join(dir, 'absent.json'), 1).failed).toBe(1);
    const garbled = path.join(dir, 'garbled.json');
    writeFileSync(garbled, '{"numPassedTests": 3,');
    expect(countVitestRun(garbled, 0)).toMatchObject({ passed: 0, failed: 1 });
  });

  it('reports a clean run as it is', () => {
    const f = report('clean.json', { numPassedTests: 4, numFailedTests: 0, testResults: [file('passed', ['passed'])] });
    expect(countVitestRun(f, 0)).toEqual({ passed: 4, failed: 0 });
  });
});

describe('formatSummary', () => {
  it('ends with the summed "N passed, N failed" line', () => {
    const lines = formatSummary(
      [
        { name: 'set-up', ms: 1200, passed: 0, failed: 0, setup: true },
        { name: 'unit', ms: 5000, passed: 40, failed: 1 },
        { name: 'api', ms: 61_000, passed: 12, failed: 0 },
      ],
      70_000,
    );
    expect(lines.at(-1)).toBe('52 passed, 1 failed');
    expect(lines.find((line) => line.includes('api'))).toContain('1 min 01 s');
    expect(lines.find((line) => line.includes('set-up'))).toMatch(/ok$/);
  });

  it('shows a failed set-up step and counts it', () => {
    const lines = formatSummary([{ name: 'set-up', ms: 10, passed: 0, failed: 1, setup: true, note: 'port taken' }], 10);
    expect(lines.find((line) => line.includes('set-up'))).toContain('FAILED  (port taken)');
    expect(lines.at(-1)).toBe('0 passed, 1 failed');
  });
});
