import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { repoRoot } from './support/api-server';
import { shots } from './support/browser-suite';
import { demoUser } from './support/sign-in';
import { useReducingSuite } from './support/worker-process';

const testTitle = 'Logger-format yaw sweep (invented)';
const profileName = 'Semicolon logger (invented)';
const sampleName = 'logger-sweep.txt';

/**
 * The example yaw sweep (7 points, `libs/aero/examples/closed-car-yaw-sweep.csv`) as an invented logger of another
 * layout writes it: semicolons between fields, decimal commas, its own names for five columns, the units in a row
 * of their own, and the side force with the opposite sign. Lines 1–4 are the example's metadata comments, line 5
 * the names, line 6 the units, data from line 7.
 */
function loggerSweep(): string {
  const lines = readFileSync(join(repoRoot, 'libs/aero/examples/closed-car-yaw-sweep.csv'), 'utf8').split('\n');
  const metadata = lines.filter((line) => line.startsWith('#'));
  const data = lines.filter((line) => line.trim() !== '' && !line.startsWith('#')).slice(1);
  const sideForce = 9; // 0-based cell of Fy [N] in the example's header row
  const rows = data.map((line) =>
    line
      .split(',')
      .map((cell, index) => {
        const value = cell.trim();
        const signed = index === sideForce ? (value.startsWith('-') ? value.slice(1) : `-${value}`) : value;
        return signed.replace('.', ',');
      })
      .join(';'),
  );
  return [
    ...metadata,
    'time;step;beta;pitch;qinf;pamb;tamb;RH;Fx;Fy;Fz;Mx;My;Mz',
    's;;deg;deg;Pa;hPa;degC;%;N;N;N;N m;N m;N m',
    ...rows,
    '',
  ].join('\n');
}

describe('import profiles', () => {
  const suite = useReducingSuite(
    { title: testTitle, articleName: 'Estate car model for the logger, 1:4 (invented)', balanceIdentifier: 'SB-E2E-IP', configuration: { label: 'baseline', description: 'as delivered' } },
    '/tmp/tw-e2e-import-profiles-worker.log',
  );
  const sample = { name: sampleName, mimeType: 'text/plain', buffer: Buffer.from(loggerSweep(), 'utf8') };

  it('a technician writes a profile for a semicolon, decimal-comma file, fixes it on the sample, saves it and uploads the file read with it', async () => {
    const page = await suite.signedIn(demoUser('technician').email);
    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Import profiles' }).click();
    await page.getByRole('heading', { name: 'No import profiles yet' }).waitFor();
    await page.getByRole('link', { name: 'New profile' }).click();

    await page.getByLabel('Name', { exact: true }).fill(profileName);
    await page.getByLabel('Description').fill('Files of the invented bench logger: semicolons, decimal commas, units below the names');
    await page.getByRole('combobox', { name: /Between fields/ }).click();
    await page.getByRole('option', { name: /Semicolon/ }).click();
    await page.getByRole('checkbox', { name: /own row/ }).check();

    const renames: [string, string][] = [
      ['step', 'point · set-condition number'],
      ['beta', 'yaw · yaw angle'],
      ['qinf', 'q · dynamic pressure'],
      ['pamb', 'p_baro · barometric pressure'],
      ['tamb', 'T_air · air temperature'],
    ];
    for (const [index, [source, ours]] of renames.entries()) {
      await page.getByRole('button', { name: 'Add a column' }).click();
      await page.getByLabel(`Their column ${index + 1}`, { exact: true }).fill(source);
      await page.getByRole('combobox', { name: new RegExp(`^Our column ${index + 1}`) }).click();
      await page.getByRole('option', { name: ours, exact: true }).click();
    }
    await page.getByRole('button', { name: 'Add a column' }).click();
    await page.getByLabel('Their column 6', { exact: true }).fill('Fy');
    await page.getByLabel('Scale factor 6', { exact: true }).fill('-1');

    // The decimal comma is still off: the sample's commas split its numbers, and the reader says where.
    await page.getByLabel('Choose a sample file').setInputFiles(sample);
    const issues = page.getByRole('list', { name: 'Issues found' });
    await issues.waitFor();
    await expect.poll(() => issues.locator('li').first().innerText()).toMatch(/^Line 7, column \d+: /);
    expect(await page.getByRole('button', { name: 'Save profile' }).isDisabled()).toBe(true);
    await page.screenshot({ path: `${shots}/import-profile-issue.png`, fullPage: true });

    await page.getByRole('checkbox', { name: /decimal comma/ }).check();
    await page.getByText('The profile changed since this try.').waitFor();
    await page.getByRole('button', { name: 'Try the sample again' }).click();
    await page.getByText(/samples in 7 points/).waitFor();
    await page.getByRole('table', { name: 'First rows, in SI units' }).waitFor();
    const columns = await page.getByLabel('Detected columns').innerText();
    expect(columns).toContain('p_baro (hPa → Pa)');
    expect(columns).toContain('T_air (degC → K)');
    await page.screenshot({ path: `${shots}/import-profile-clean.png`, fullPage: true });
    await page.getByRole('button', { name: 'Save profile' }).click();

    const list = page.getByRole('table', { name: 'Import profiles' });
    await list.waitFor();
    const row = list.locator('tr', { hasText: profileName });
    await expect.poll(() => row.innerText()).toContain('semicolon between fields · decimal comma · units in their own row · renames 5 column(s) · scales 1 column(s)');
    await page.screenshot({ path: `${shots}/import-profiles-list.png`, fullPage: true });

    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Tests' }).click();
    await page.getByRole('link', { name: testTitle }).click();
    await page.getByRole('link', { name: 'Upload run files' }).click();
    await page.getByLabel('Configuration label').fill('baseline');
    await page.getByRole('button', { name: 'Create run' }).click();
    await expect.poll(() => page.getByRole('combobox', { name: 'Run' }).innerText()).toContain('Run 1');

    await page.getByRole('combobox', { name: /Read with/ }).click();
    await page.getByRole('option', { name: profileName }).click();
    await page.getByLabel('Choose run files').setInputFiles(sample);
    await page.getByText(/samples in 7 points/).waitFor();
    await page.getByRole('button', { name: /Upload 1 checked file/ }).click();
    await page.getByText(/Reduction v1: Reduced, 7 points/).waitFor({ timeout: 60_000 });
    await page.screenshot({ path: `${shots}/import-profile-uploaded.png`, fullPage: true });

    await page.getByRole('link', { name: 'Back to the test' }).click();
    await page.getByRole('link', { name: 'Run 1' }).click();
    const points = page.getByRole('table', { name: 'Reduced points' });
    await points.waitFor();
    await expect.poll(() => points.locator('tbody tr').count()).toBe(7);
  }, 180_000);

  it('an analyst edits the profile, tried on the sample again, then archives it after confirming, and uploads no longer offer it', async () => {
    const page = await suite.signedIn(demoUser('analyst').email);
    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Import profiles' }).click();
    await page.getByRole('link', { name: `Edit ${profileName}` }).click();
    await expect.poll(() => page.getByLabel('Name', { exact: true }).inputValue()).toBe(profileName);
    expect(await page.getByLabel('Their column 3', { exact: true }).inputValue()).toBe('qinf');
    expect(await page.getByRole('checkbox', { name: /decimal comma/ }).isChecked()).toBe(true);

    await page.getByLabel('Description').fill('Files of the invented bench logger, firmware 2 and later');
    expect(await page.getByRole('button', { name: 'Save changes' }).isDisabled()).toBe(true);
    await page.getByLabel('Choose a sample file').setInputFiles(sample);
    await page.getByText(/samples in 7 points/).waitFor();
    await page.getByRole('button', { name: 'Save changes' }).click();
    const list = page.getByRole('table', { name: 'Import profiles' });
    await expect.poll(() => list.locator('tr', { hasText: profileName }).innerText()).toContain('firmware 2 and later');

    await page.getByRole('button', { name: `Archive ${profileName}` }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByText('Reductions that used it keep the copy they were read with.').waitFor();
    await page.screenshot({ path: `${shots}/import-profile-archive.png` });
    await dialog.getByRole('button', { name: 'Archive' }).click();
    await page.getByRole('heading', { name: 'No import profiles yet' }).waitFor();
    await page.getByRole('switch', { name: 'Show archived' }).click();
    await expect.poll(() => list.locator('tr', { hasText: profileName }).innerText()).toContain('Archived');


    // Analysts do not upload; the technician's upload page no longer offers the archived profile.
    const technician = await suite.signedIn(demoUser('technician').email);
    await technician.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Tests' }).click();
    await technician.getByRole('link', { name: testTitle }).click();
    await technician.getByRole('link', { name: 'Upload run files' }).click();
    await technician.getByRole('combobox', { name: /Read with/ }).click();
    await expect.poll(() => technician.getByRole('option').allInnerTexts()).toEqual(["Tunnelwright's own format"]);
  }, 120_000);
});
