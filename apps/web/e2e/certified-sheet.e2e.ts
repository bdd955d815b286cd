import { createHash } from 'node:crypto';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { simpleParser } from 'mailparser';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { demoCustomers, demoPassword } from '../../../scripts/seed/demo-users';
import { repoRoot } from './support/api-server';
import { shots } from './support/browser-suite';
import { demoUser } from './support/sign-in';
import { useReducingSuite } from './support/worker-process';

const exampleFile = join(repoRoot, 'libs/aero/examples/closed-car-yaw-sweep.csv');
const testTitle = 'Hatchback roof-rail yaw sweep (invented)';

/** The text of the newest mail to `to` whose subject matches, read from the SMTP fake's folder, waiting for it to arrive. */
async function mailTo(mailDir: string, to: string, subject: RegExp): Promise<{ subject: string; text: string }> {
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    for (const name of readdirSync(mailDir).sort().reverse()) {
      const parsed = await simpleParser(readFileSync(join(mailDir, name)));
      const recipients = [parsed.to ?? []].flat().flatMap((address) => address.value.map((entry) => entry.address?.toLowerCase()));
      if (recipients.includes(to.toLowerCase()) && subject.test(parsed.subject ?? '')) {
        return { subject: parsed.subject ?? '', text: parsed.text ?? '' };
      }
    }
    await new Promise((done) => setTimeout(done, 250));
  }
  throw new Error(`No mail to ${to} with a subject matching ${subject} arrived within 30 s`);
}

async function openTest(page: Page): Promise<void> {
  await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Tests', exact: true }).click();
  await page.getByRole('link', { name: testTitle }).click();
  await page.getByRole('heading', { name: testTitle, level: 1 }).waitFor();
}

const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

describe('certified result sheet', () => {
  const suite = useReducingSuite(
    { title: testTitle, articleName: 'Hatchback model with roof rails, 1:4 (invented)', balanceIdentifier: 'SB-E2E-CERT-1', configuration: { label: 'rails on', description: 'roof rails fitted' } },
    '/tmp/tw-e2e-certified-worker.log',
  );
  let reportNumber = '';
  let pdf: Buffer = Buffer.alloc(0);

  it('a technician uploads a run and submits its reduction; the analyst, who holds a signing right, approves it and issues the sheet', async () => {
    const technician = await suite.signedIn(demoUser('technician').email);
    await openTest(technician);
    await technician.getByRole('link', { name: 'Upload run files' }).click();
    await technician.getByLabel('Configuration label').fill('rails on');
    await technician.getByRole('button', { name: 'Create run' }).click();
    await expect.poll(() => technician.getByRole('combobox', { name: 'Run' }).innerText()).toContain('Run 1');
    await technician.getByLabel('Choose run files').setInputFiles(exampleFile);
    await technician.getByText(/samples in 7 points/).waitFor();
    await technician.getByRole('button', { name: /Upload 1 checked file/ }).click();
    await technician.getByText(/Reduction v1: Reduced, 7 points/).waitFor({ timeout: 60_000 });
    await technician.getByRole('link', { name: 'Back to the test' }).click();

    await technician.getByRole('button', { name: 'Submit for approval' }).click();
    const submit = technician.getByRole('dialog');
    // The newest done version of the run is chosen already.
    await expect.poll(() => submit.getByRole('combobox', { name: /^Run 1/ }).innerText()).toMatch(/v1 · 7 points/);
    await submit.getByLabel('Note for the analyst').fill('Yaw sweep with the roof rails fitted.');
    await submit.getByRole('button', { name: 'Submit for approval' }).click();
    await technician.getByText('Submission 1 is waiting for approval.').waitFor();
    const waiting = technician.getByRole('listitem', { name: 'Submission 1' });
    await waiting.getByText('Waiting for approval').waitFor();
    // The technician neither decides nor issues; the panel says who does.
    await waiting.getByRole('note').getByText(/Only an analyst holding a signing right/).waitFor();
    await technician.screenshot({ path: `${shots}/certified-submitted.png`, fullPage: true });

    const analyst = await suite.signedIn(demoUser('analyst').email);
    await openTest(analyst);
    const card = analyst.getByRole('listitem', { name: 'Submission 1' });
    await card.getByText(`by ${demoUser('technician').name}`, { exact: false }).first().waitFor();
    await card.getByText(/Run 1 \(Data, rails on\), v1, uploaded by/).waitFor();
    await card.getByText('Yaw sweep with the roof rails fitted.').waitFor();
    await card.getByRole('button', { name: 'Approve' }).click();
    const approve = analyst.getByRole('dialog');
    await approve.getByLabel('Comment (optional)').fill('Repeatability within the method limit.');
    await approve.getByRole('button', { name: 'Approve' }).click();
    await analyst.getByText('Submission 1 approved.').waitFor();
    await card.getByText('Approved, sheet not issued yet').waitFor();

    await card.getByRole('button', { name: 'Issue result sheet' }).click();
    const issue = analyst.getByRole('dialog');
    await issue.getByText(/published to the customer and e-mailed/).waitFor();
    await issue.getByRole('button', { name: 'Issue result sheet' }).click();
    const issued = analyst.getByText(/issued and sent to the customer/);
    await issued.waitFor({ timeout: 30_000 });
    reportNumber = /(\S+) issued and sent to the customer/.exec(await issued.innerText())?.[1] ?? '';
    expect(reportNumber).toMatch(/^[A-Z]+-\d{4}-\d{4}-R1$/);
    await card.getByText(`Approved, issued as ${reportNumber}`).waitFor();
    // Where the test stands follows at once.
    await analyst.getByText(`Complete · Certified: ${reportNumber}`).waitFor();
    const sheets = analyst.getByRole('table', { name: 'Result sheets of this test' });
    await sheets.getByRole('row').filter({ hasText: reportNumber }).getByText('Valid').waitFor();
    await analyst.getByRole('note').filter({ hasText: /licensed engineer|design/i }).first().waitFor();
    await analyst.screenshot({ path: `${shots}/certified-issued.png`, fullPage: true });
  }, 120_000);

  it('the customer follows the e-mailed link, signs in, downloads the PDF and the public page says it is exactly the issued file, and a one-byte change is not', async () => {
    expect(reportNumber).not.toBe('');
    const customer = demoUser('customer', demoCustomers.quillfen);
    const mail = await mailTo(suite.api.mail.mailDir, customer.email, new RegExp(`^Result sheet ${reportNumber} is ready`));
    const link = new RegExp(`${suite.api.baseUrl.replace(/[.:/]/g, '\\$&')}/documents/[0-9a-f-]{36}`).exec(mail.text)?.[0];
    expect(link).toBeDefined();

    const page = await suite.browser.freshPage();
    await page.goto(link!);
    // Signed out, the link leads through sign-in and back to the sheet.
    await page.getByLabel('E-mail').fill(customer.email);
    await page.getByLabel('Password').fill(demoPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: reportNumber, level: 1 }).waitFor();
    expect(new URL(page.url()).pathname).toBe(new URL(link!).pathname);
    await page.getByText(testTitle).waitFor();
    await page.getByRole('note').filter({ hasText: /licensed engineer|design/i }).first().waitFor();
    const shownHash = (await page.locator('code.hash').innerText()).trim();
    expect(shownHash).toMatch(/^[0-9a-f]{64}$/);

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: `Download PDF of ${reportNumber}` }).click()]);
    expect(download.suggestedFilename()).toBe(`${reportNumber}.pdf`);
    pdf = readFileSync((await download.path())!);
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(sha256(pdf)).toBe(shownHash);
    await page.screenshot({ path: `${shots}/certified-document.png`, fullPage: true });

    // The customer's list has it too, with its state.
    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Documents' }).click();
    await page.getByRole('heading', { name: 'Documents', level: 1 }).waitFor();
    await page.getByRole('row').filter({ hasText: reportNumber }).getByText('Valid').waitFor();

    // Approved, the run's points are the customer's to see on their test too, with the caution.
    await openTest(page);
    const run = page.getByRole('table', { name: 'Runs' }).getByRole('row').filter({ hasText: 'Run 1' });
    await run.getByText('Approved (v1)').waitFor();
    await run.getByRole('cell').filter({ hasText: /^7$/ }).waitFor();
    await run.locator('tw-cd-yaw-chart canvas').waitFor();
    await page.getByRole('note').filter({ hasText: /not design loads/ }).first().waitFor();

    // Anyone holding the file checks it without signing in.
    const check = await suite.browser.freshPage();
    await check.goto(`${suite.api.baseUrl}/verify/${reportNumber}`);
    await check.getByRole('heading', { name: 'Check a result sheet' }).waitFor();
    const issued = check.getByRole('region', { name: 'Issued sheet' });
    await issued.getByText(reportNumber, { exact: true }).waitFor();
    await issued.getByText('Valid', { exact: true }).waitFor();
    await issued.getByText(shownHash).waitFor();
    await check.getByLabel('Choose the PDF').setInputFiles({ name: `${reportNumber}.pdf`, mimeType: 'application/pdf', buffer: pdf });
    await check.getByText(`Match: ${reportNumber}.pdf is exactly the issued file of ${reportNumber}.`).waitFor();
    await check.screenshot({ path: `${shots}/certified-verify-match.png`, fullPage: true });

    // One byte changed, chosen through the keyboard: focus the drop zone, Enter opens the file dialog.
    const tampered = Buffer.from(pdf);
    const at = Math.floor(tampered.length / 2);
    tampered[at] = tampered[at]! ^ 0x01;
    // The wait starts before the focus: playwright turns on its file-dialog interception when the first listener
    // is added, without waiting for chromium to confirm, so a key pressed in the same breath can open the dialog
    // before it is intercepted and the event never comes.
    const chosen = check.waitForEvent('filechooser');
    await check.getByRole('button', { name: /^Drop the PDF here/ }).focus();
    await check.keyboard.press('Enter');
    const chooser = await chosen;
    await chooser.setFiles({ name: 'edited.pdf', mimeType: 'application/pdf', buffer: tampered });
    await check.getByText(`No match: edited.pdf is not the issued file of ${reportNumber}.`).waitFor();
    await check.getByText(sha256(tampered)).waitFor();
    await check.screenshot({ path: `${shots}/certified-verify-tampered.png`, fullPage: true });

    // A number never issued says so plainly.
    await check.getByLabel('Report number').fill('ZZ-1900-0000-R1');
    await check.keyboard.press('Enter');
    await check.getByText('No sheet numbered ZZ-1900-0000-R1 was issued.').waitFor();
  }, 120_000);

  it('a revision needs its reason and supersedes the sheet, which the public check then says; the lab manager reads it all in the audit trail and sees who holds a signing right', async () => {
    expect(reportNumber).not.toBe('');
    const technician = await suite.signedIn(demoUser('technician').email);
    await openTest(technician);
    await technician.getByRole('button', { name: 'Submit for approval' }).click();
    await technician.getByRole('dialog').getByLabel('Note for the analyst').fill('Same run, checked again after the customer asked about the roof rails.');
    await technician.getByRole('dialog').getByRole('button', { name: 'Submit for approval' }).click();
    await technician.getByText('Submission 2 is waiting for approval.').waitFor();

    const analyst = await suite.signedIn(demoUser('analyst').email);
    await openTest(analyst);
    const second = analyst.getByRole('listitem', { name: 'Submission 2' });
    await second.getByRole('button', { name: 'Send back' }).click();
    const sendBack = analyst.getByRole('dialog');
    await sendBack.getByLabel('Reason').fill('Too short');
    await sendBack.getByRole('button', { name: 'Send back' }).click();
    await sendBack.getByText('Write at least 10 characters').waitFor();
    await sendBack.getByRole('button', { name: 'Cancel' }).click();
    await second.getByRole('button', { name: 'Approve' }).click();
    await analyst.getByRole('dialog').getByRole('button', { name: 'Approve' }).click();
    await second.getByText('Approved, sheet not issued yet').waitFor();

    // A lab manager issues too; the test already has a valid sheet, so the revision must say why.
    const manager = await suite.signedIn(demoUser('lab_manager').email);
    await openTest(manager);
    await manager.getByRole('listitem', { name: 'Submission 2' }).getByRole('button', { name: 'Issue result sheet' }).click();
    const issue = manager.getByRole('dialog');
    await issue.getByText(`${reportNumber} will be marked superseded by the new sheet.`).waitFor();
    await issue.getByRole('button', { name: 'Issue result sheet' }).click();
    await issue.getByText('Say why the sheet is revised').waitFor();
    await issue.getByLabel('Reason for the revision').fill('Roof-rail configuration label corrected on the sheet.');
    await issue.getByRole('button', { name: 'Issue result sheet' }).click();
    const revision = reportNumber.replace(/-R1$/, '-R2');
    await manager.getByText(`${revision} issued and sent to the customer.`).waitFor({ timeout: 30_000 });
    const sheets = manager.getByRole('table', { name: 'Result sheets of this test' });
    await sheets.getByRole('row').filter({ hasText: reportNumber }).getByText(`Superseded by ${revision}`).waitFor();

    const trail = manager.getByRole('table', { name: 'Audit trail of this test' });
    await trail.getByRole('row').filter({ hasText: 'Result sheet superseded' }).getByText(/Roof-rail configuration label corrected/).waitFor();
    await trail.getByRole('row').filter({ hasText: 'Approved' }).first().waitFor();
    await trail.getByRole('row').filter({ hasText: 'Submitted for approval' }).first().waitFor();
    await manager.screenshot({ path: `${shots}/certified-revision.png`, fullPage: true });

    await manager.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Signing rights' }).click();
    await manager.getByRole('heading', { name: 'Signing rights', level: 1 }).waitFor();
    await manager.getByRole('table', { name: 'Current holders' }).getByText(demoUser('analyst').name).waitFor();

    // The older sheet is still genuine, but the public check says it is no longer current.
    const check = await suite.browser.freshPage();
    await check.goto(`${suite.api.baseUrl}/verify/${reportNumber}`);
    const issued = check.getByRole('region', { name: 'Issued sheet' });
    await issued.getByText('Superseded', { exact: true }).waitFor();
    await issued.getByRole('link', { name: revision }).waitFor();
    await check.getByLabel('Choose the PDF').setInputFiles({ name: `${reportNumber}.pdf`, mimeType: 'application/pdf', buffer: pdf });
    await check.getByText(new RegExp(`superseded by ${revision}; use the newer sheet`)).waitFor();
    await issued.getByRole('link', { name: revision }).click();
    await check.getByRole('region', { name: 'Issued sheet' }).getByText('Valid', { exact: true }).waitFor();
  }, 120_000);
});
