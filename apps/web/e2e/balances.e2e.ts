import { describe, expect, it } from 'vitest';
import { shots, useBrowserSuite } from './support/browser-suite';
import { openDemoTest } from './support/demo-test';
import { demoUser } from './support/sign-in';

const suffix = Date.now().toString(36).toUpperCase();
const overdueTitle = `Hatchback wake survey ${suffix} (invented)`;
const overdueBalance = `OB-${suffix}`;

/** An invented linear matrix as a calibration report's table is often copied: tab-separated rows, mV/V per N or N·m. */
const linearRows = [0, 1, 2, 3, 4, 5].map((i) => [0, 1, 2, 3, 4, 5].map((j) => (i === j ? (0.002 + 0.0001 * i).toFixed(4) : '0')).join('\t'));

/** A running test of the first demo customer on a balance whose only calibration was due in July 2025; its id. */
function openOverdueTest(): Promise<string> {
  return openDemoTest({
    title: overdueTitle,
    articleName: `Hatchback model ${suffix}, 1:4 (invented)`,
    balanceIdentifier: overdueBalance,
    configuration: { label: 'baseline', description: 'as delivered' },
    calibration: { calibratedOn: '2025-01-10', dueOn: '2025-07-10' },
  });
}

describe('balances and calibrations', () => {
  let overdueTestId = '';
  const suite = useBrowserSuite({
    afterApiStart: async () => {
      overdueTestId = await openOverdueTest();
    },
  });

  it('a lab manager adds a balance after fixing what the form points out, records a calibration and sees it current', async () => {
    const identifier = `UFB-${suffix}`;
    const page = await suite.signedIn(demoUser('lab_manager').email);
    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Balances' }).click();
    await page.getByRole('heading', { name: 'Balances' }).waitFor();
    await page.getByRole('button', { name: 'New balance' }).click();

    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Mz capacity (N·m)').fill('0');
    await dialog.getByRole('button', { name: 'Create balance' }).click();
    await dialog.getByText('Enter the identifier').waitFor();
    await dialog.getByText('Enter the Fx capacity').waitFor();
    await dialog.getByText('Mz capacity must be greater than zero').waitFor();
    await page.screenshot({ path: `${shots}/balance-form-errors.png` });

    await dialog.getByLabel('Identifier').fill(identifier);
    await dialog.getByLabel('Description').fill('Invented under-floor six-component balance');
    const capacities = ['500', '500', '1500', '150', '250', '150'];
    for (const [index, label] of ['Fx capacity (N)', 'Fy capacity (N)', 'Fz capacity (N)', 'Mx capacity (N·m)', 'My capacity (N·m)', 'Mz capacity (N·m)'].entries()) {
      await dialog.getByLabel(label).fill(capacities[index] ?? '');
    }
    await dialog.getByRole('button', { name: 'Create balance' }).click();
    await page.getByText(`Balance ${identifier} added.`).waitFor();
    const row = page.getByRole('row').filter({ hasText: identifier });
    await row.getByText('Not calibrated').waitFor();
    expect(await row.innerText()).toContain('1,500');

    await row.getByRole('button', { name: `Record calibration of ${identifier}` }).click();
    const record = page.getByRole('dialog', { name: `Record calibration of ${identifier}` });
    await record.getByText('This becomes version 1.').waitFor();
    const bad = [...linearRows];
    bad[2] = '0\t0\t0.0022\tO.01\t0\t0';
    await record.getByLabel('Or paste the linear matrix as text').fill(bad.join('\n'));
    await record.getByRole('button', { name: 'Fill the grid from the text' }).click();
    await page.screenshot({ path: `${shots}/calibration-paste-problems.png` });
    await record.getByText('Row 3, column 4 (Mx): “O.01” is not a number').waitFor();
    await record.getByLabel('Calibrated on').fill('2026-11-20');
    await record.getByLabel('Due on').fill('2026-11-01');
    await record.getByRole('button', { name: 'Record version 1' }).click();
    await record.getByText('The due date cannot be before the calibration date').waitFor();
    await record.getByText('Row 1, column 1 (Fx): enter a number').waitFor();
    await page.screenshot({ path: `${shots}/calibration-form-errors.png` });

    await record.getByLabel('Or paste the linear matrix as text').fill(linearRows.join('\n'));
    await record.getByRole('button', { name: 'Fill the grid from the text' }).click();
    expect(await record.getByLabel('Row 2, column 2 (Fy)').inputValue()).toBe('0.0021');
    await record.getByLabel('Due on').fill('2099-11-20');
    await record.getByRole('button', { name: 'Record version 1' }).click();
    await page.getByText(`Calibration version 1 of ${identifier} recorded.`).waitFor();
    await row.getByText(/Due in \d+ days/).waitFor();
    expect(await row.innerText()).toContain('v1');
    await page.screenshot({ path: `${shots}/balances-list.png`, fullPage: true });

    await row.getByRole('button', { name: `Calibrations of ${identifier}` }).click();
    const history = page.getByRole('dialog');
    await history.getByRole('table', { name: 'Calibration versions' }).waitFor();
    expect(await history.innerText()).toContain(`by ${demoUser('lab_manager').name}`);
  });

  it('a technician is warned of the overdue calibration; a lab manager allows it with a reason and the override shows', async () => {
    const technician = await suite.signedIn(demoUser('technician').email);
    await technician.goto(`${suite.api.baseUrl}/tests/${overdueTestId}`);
    await technician.getByRole('heading', { name: 'Balance calibration overdue' }).waitFor();
    expect(await technician.getByRole('region', { name: 'Balance calibration overdue' }).innerText()).toContain(`balance ${overdueBalance} was due on`);
    expect(await technician.getByRole('button', { name: 'Allow overdue calibration…' }).count()).toBe(0);

    const page = await suite.signedIn(demoUser('lab_manager').email);
    await page.goto(`${suite.api.baseUrl}/tests/${overdueTestId}`);
    await page.getByRole('button', { name: 'Allow overdue calibration…' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByRole('button', { name: 'Allow overdue calibration' }).click();
    await dialog.getByText('Say why the overdue calibration may be used').waitFor();
    await dialog.getByLabel('Reason').fill('Check loading on 2026-11-28 agreed with version 1 within 0.1 %');
    await dialog.getByRole('button', { name: 'Allow overdue calibration' }).click();
    await page.getByRole('heading', { name: 'Overdue calibration allowed for this test' }).waitFor();
    const notice = page.getByRole('region', { name: 'Overdue calibration allowed for this test' });
    expect(await notice.innerText()).toContain('“Check loading on 2026-11-28 agreed with version 1 within 0.1 %”');
    expect(await notice.innerText()).toContain(`${demoUser('lab_manager').name} allowed it on`);
    expect(await page.getByRole('button', { name: 'Allow overdue calibration…' }).count()).toBe(0);
    await page.screenshot({ path: `${shots}/calibration-override.png`, fullPage: true });

    const later = await suite.signedIn(demoUser('technician').email);
    await later.goto(`${suite.api.baseUrl}/tests/${overdueTestId}`);
    await later.getByRole('heading', { name: 'Overdue calibration allowed for this test' }).waitFor();
    expect(await later.getByText('Uploads of run files for this test are refused').count()).toBe(0);
  });
});
