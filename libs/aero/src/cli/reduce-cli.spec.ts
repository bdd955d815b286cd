import { execFile } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';

const ROOT = fileURLToPath(new URL('../../../../', import.meta.url));
const CLI = join(ROOT, 'libs/aero/src/cli/reduce-cli.ts');
const EXAMPLES = join(ROOT, 'libs/aero/examples');
const run = promisify(execFile);

/** Runs the CLI as `npm run reduce` does (node --import tsx) and returns its status and output. */
async function cli(...args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  try {
    const { stdout, stderr } = await run(process.execPath, ['--import', 'tsx', CLI, ...args], { cwd: ROOT, maxBuffer: 64 << 20 });
    return { code: 0, stdout, stderr };
  } catch (error) {
    const e = error as { code: number; stdout: string; stderr: string };
    return { code: e.code, stdout: e.stdout, stderr: e.stderr };
  }
}

describe('reduce CLI', { timeout: 60_000 }, () => {
  it('reduces both example runs cleanly to JSON carrying the design caution', async () => {
    for (const name of ['closed-car-yaw-sweep', 'open-jet-bridges']) {
      const { code, stdout, stderr } = await cli(join(EXAMPLES, `${name}.csv`), '--config', join(EXAMPLES, `${name}.config.json`));
      expect(stderr).toBe('');
      expect(code).toBe(0);
      const result = JSON.parse(stdout);
      expect(result.caution).toMatch(/not design loads/);
      expect(result.warnings).toEqual([]);
      expect(result.points.length).toBeGreaterThanOrEqual(5);
      expect(result.inputSha256).toMatch(/^[0-9a-f]{64}$/);
    }
  });

  it('prints CSV with --format csv', async () => {
    const { code, stdout } = await cli(join(EXAMPLES, 'closed-car-yaw-sweep.csv'), '--config', join(EXAMPLES, 'closed-car-yaw-sweep.config.json'), '--format', 'csv');
    expect(code).toBe(0);
    expect(stdout).toMatch(/^# engine version: /);
    expect(stdout).toMatch(/\npoint,samples,yaw \[deg\]/);
  });

  it('exits 2 and prints file:line:column: CODE message for a bad run file', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'tw-cli-'));
    const bad = join(dir, 'bad.csv');
    writeFileSync(
      bad,
      'time [s], point, yaw [deg], pitch [deg], q [Pa], p_baro [hPa], T_air [degC], RH [%], Fx [N], Fy [N], Fz [N], Mx [N m], My [N m], Mz [N m]\n' +
        '0.0, 1, 0, 0, 600, 1013.25, 20, 50, 60, 0, 10, 0, 0, 0\n' +
        '0.1, 1, 0, 0, 6x0, 1013.25, 20, 50, 60, 0, 10, 0, 0, 0\n',
    );
    const { code, stderr, stdout } = await cli(bad, '--config', join(EXAMPLES, 'closed-car-yaw-sweep.config.json'));
    expect(code).toBe(2);
    expect(stdout).toBe('');
    // The column is 1-based: where "6x0" starts on line 3.
    const column = '0.1, 1, 0, 0, 6x0'.indexOf('6x0') + 1;
    expect(stderr.startsWith(`${bad}:3:${column}: NOT_A_NUMBER `)).toBe(true);
  });

  it('exits 2 with the location of a zero-wind sample', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'tw-cli-'));
    const still = join(dir, 'still.csv');
    writeFileSync(
      still,
      'time [s], point, yaw [deg], pitch [deg], q [Pa], p_baro [hPa], T_air [degC], RH [%], Fx [N], Fy [N], Fz [N], Mx [N m], My [N m], Mz [N m]\n' +
        '0.0, 1, 0, 0, 0, 1013.25, 20, 50, 0, 0, 0, 0, 0, 0\n',
    );
    const { code, stderr } = await cli(still, '--config', join(EXAMPLES, 'closed-car-yaw-sweep.config.json'));
    expect(code).toBe(2);
    expect(stderr).toContain(`${still}:2:1: ZERO_WIND`);
  });

  it('exits 2 naming the field of a bad configuration', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'tw-cli-'));
    const config = join(dir, 'config.json');
    writeFileSync(config, JSON.stringify({ tunnel: { kind: 'closed', sectionArea: 0 }, article: { referenceArea: 0.2, referenceAreaKind: 'frontal', referenceLength: 1 } }));
    const { code, stderr } = await cli(join(EXAMPLES, 'closed-car-yaw-sweep.csv'), '--config', config);
    expect(code).toBe(2);
    expect(stderr).toContain(`${config}:1:1: CONFIG_INVALID tunnel.sectionArea:`);
  });

  it('explains its options with --help and refuses a missing --config', async () => {
    const help = await cli('--help');
    expect(help.code).toBe(0);
    expect(help.stdout).toMatch(/--config <file>/);
    const missing = await cli(join(EXAMPLES, 'closed-car-yaw-sweep.csv'));
    expect(missing.code).toBe(2);
    expect(missing.stderr).toMatch(/--config <config.json> is required/);
  });
});
