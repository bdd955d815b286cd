import { DateTime } from 'luxon';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { shots, useBrowserSuite } from './support/browser-suite';
import { demoUser } from './support/sign-in';

async function openSection(page: Page, label: string, heading: string): Promise<void> {
  await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: label, exact: true }).click();
  await page.getByRole('heading', { name: heading, level: 1 }).waitFor();
}

describe('booking tunnel time', () => {
  const suite = useBrowserSuite();

  it('a customer requests time, the lab manager quotes it, the customer accepts, both see it confirmed and the invitation is mailed', async () => {
    const customer = demoUser('customer');
    const manager = demoUser('lab_manager');
    const article = `Roof-box model ${Date.now().toString(36)}`;
    // Far beyond the seeded demo bookings, so the slot is free.
    const day = DateTime.now().plus({ days: 90 }).toFormat('yyyy-LL-dd');

    const customerPage = await suite.signedIn(customer.email);
    await openSection(customerPage, 'My bookings', 'My bookings');
    await customerPage.getByRole('link', { name: 'Request tunnel time' }).first().click();
    await customerPage.getByRole('heading', { name: 'Request tunnel time' }).waitFor();
    await customerPage.getByRole('button', { name: 'Send request' }).click();
    await customerPage.getByText('Choose a tunnel', { exact: true }).waitFor();
    await customerPage.getByText('Name the article').waitFor();

    await customerPage.getByRole('combobox', { name: 'Tunnel' }).click();
    await customerPage.getByRole('option', { name: 'Tunnel 1 — closed section' }).click();
    await customerPage.getByRole('combobox', { name: 'Service' }).click();
    await customerPage.getByRole('option', { name: 'Full-day tunnel block' }).click();
    await customerPage.getByLabel('Start', { exact: true }).fill(`${day}T09:00`);
    await customerPage.getByLabel('End', { exact: true }).fill(`${day}T17:00`);
    await customerPage.getByLabel('Article name').fill(article);
    // The keyboard, as a user tabbing through the article row would.
    await customerPage.getByRole('combobox', { name: 'Coefficients based on' }).focus();
    await customerPage.keyboard.press('Enter');
    await customerPage.getByRole('option', { name: 'Frontal area' }).click();
    await customerPage.getByLabel('Speeds (m/s)').fill('20, 30, 40');
    await customerPage.getByLabel('Yaw from (°)').fill('-10');
    await customerPage.getByLabel('Yaw to (°)').fill('10');
    await customerPage.screenshot({ path: `${shots}/booking-request.png` });
    await customerPage.getByRole('button', { name: 'Send request' }).click();
    await customerPage.getByRole('heading', { name: 'My bookings', level: 1 }).waitFor();
    const customerCard = customerPage.locator('tw-booking-summary').filter({ hasText: article });
    await customerCard.getByText('Requested', { exact: true }).waitFor();

    const managerPage = await suite.signedIn(manager.email);
    await openSection(managerPage, 'Bookings', 'Bookings');
    const managerCard = managerPage.locator('tw-booking-summary').filter({ hasText: article });
    await managerCard.getByRole('button', { name: 'Write quote' }).click();
    await managerCard.getByLabel(/^Unit price/).fill('150');
    await managerCard.getByText('Total £1,200.00').waitFor();
    await managerCard.getByRole('button', { name: 'Add line' }).click();
    await managerCard.getByLabel(/^Unit price/).nth(1).fill('600');
    await managerCard.getByText('Total £1,800.00').waitFor();
    await managerPage.screenshot({ path: `${shots}/booking-quote.png` });
    await managerCard.getByRole('button', { name: 'Send quote' }).click();
    await managerPage.getByText('Quote sent to the customer.').waitFor();
    await managerCard.getByText('Quote to answer', { exact: true }).waitFor();

    // One tab at a time: each sign-in starts from a fresh page.
    const answerPage = await suite.signedIn(customer.email);
    await openSection(answerPage, 'My bookings', 'My bookings');
    const answerCard = answerPage.locator('tw-booking-summary').filter({ hasText: article });
    await answerCard.getByText('Quote to answer', { exact: true }).waitFor();
    expect(await answerCard.getByTestId('quote-total').innerText()).toBe('£1,800.00');
    await answerCard.getByRole('button', { name: 'Accept quote' }).click();
    await answerPage.getByRole('dialog').getByText('£1,800.00').waitFor();
    await answerPage.getByRole('dialog').getByRole('button', { name: 'Accept quote' }).click();
    await answerCard.getByText('Confirmed', { exact: true }).waitFor();
    await answerPage.screenshot({ path: `${shots}/booking-confirmed.png` });

    const checkPage = await suite.signedIn(manager.email);
    await openSection(checkPage, 'Bookings', 'Bookings');
    await checkPage.locator('tw-booking-summary').filter({ hasText: article }).getByText('Confirmed', { exact: true }).waitFor();

    await checkPage.goto(`${suite.api.baseUrl}/dev-mailbox`);
    const mail = checkPage.locator('mat-expansion-panel').filter({ hasText: 'Booking confirmed: Tunnel 1' }).filter({ hasText: customer.email }).first();
    await mail.waitFor();
    await mail.click();
    await mail.getByText(/booking\.ics \(text\/calendar/).waitFor();

    // The lab manager moves the confirmed booking a day later; the customer is mailed the replacing calendar entry.
    const later = DateTime.now().plus({ days: 91 }).toFormat('yyyy-LL-dd');
    const movePage = await suite.signedIn(manager.email);
    await openSection(movePage, 'Bookings', 'Bookings');
    const moveCard = movePage.locator('tw-booking-summary').filter({ hasText: article });
    await moveCard.getByRole('button', { name: 'Move…' }).click();
    const move = movePage.getByRole('dialog');
    await move.getByRole('heading', { name: 'Move the booking' }).waitFor();
    await move.getByLabel('End', { exact: true }).fill(`${day}T08:00`);
    await move.getByRole('button', { name: 'Move booking' }).click();
    await move.getByText('The end must be after the start.').waitFor();
    await move.getByLabel('Start', { exact: true }).fill(`${later}T09:00`);
    await move.getByLabel('End', { exact: true }).fill(`${later}T17:00`);
    await move.getByLabel('Note to the customer').fill('The balance is needed elsewhere on the first day.');
    await move.getByRole('button', { name: 'Move booking' }).click();
    await movePage.getByText('Booking moved; the customer was sent the updated calendar entry.').waitFor();
    await movePage.goto(`${suite.api.baseUrl}/dev-mailbox`);
    const moved = movePage.locator('mat-expansion-panel').filter({ hasText: 'Booking moved' }).filter({ hasText: customer.email }).first();
    await moved.waitFor();
    await moved.click();
    await moved.getByText(/booking\.ics \(text\/calendar/).waitFor();

    // When the tunnel work starts, the lab manager links the customer's test record that will hold the runs.
    await openSection(movePage, 'Bookings', 'Bookings');
    await movePage.locator('tw-booking-summary').filter({ hasText: article }).getByRole('button', { name: 'Mark in test' }).click();
    const start = movePage.getByRole('dialog');
    await start.getByRole('combobox', { name: 'Test record for its runs' }).click();
    await movePage.getByRole('option', { name: 'Estate car yaw sweep, baseline and mirrors off' }).click();
    await start.getByRole('button', { name: 'Mark in test' }).click();
    await movePage.getByText('Marked in test.').waitFor();
    await movePage.locator('tw-booking-summary').filter({ hasText: article }).getByText('In test', { exact: true }).waitFor();
  });

  it('a customer attaches a saved plan, whose tunnel hours set the end, and a PNG drawing; the lab manager sees and downloads the drawing', async () => {
    const customer = demoUser('customer');
    const manager = demoUser('lab_manager');
    const article = `Inspection trolley ${Date.now().toString(36)}`;
    const day = DateTime.now().plus({ days: 97 }).toFormat('yyyy-LL-dd');
    // A 1×1 PNG: the API checks that the content matches the extension.
    const drawing = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==', 'base64');

    const customerPage = await suite.signedIn(customer.email);
    await openSection(customerPage, 'My bookings', 'My bookings');
    await customerPage.getByRole('link', { name: 'Request tunnel time' }).first().click();
    await customerPage.getByRole('heading', { name: 'Request tunnel time' }).waitFor();
    // The tunnel list opens with its options only once they have loaded.
    await customerPage.getByRole('progressbar', { name: 'Loading tunnels' }).waitFor({ state: 'detached' });
    await customerPage.getByRole('combobox', { name: 'Tunnel' }).click();
    await customerPage.getByRole('option', { name: 'Tunnel 1 — closed section' }).click();
    await customerPage.getByRole('combobox', { name: 'Saved test plan' }).click();
    await customerPage.getByRole('option', { name: /^Inspection trolley with rider/ }).click();
    await customerPage.getByTestId('plan-duration').getByText(/h of tunnel time/).waitFor();
    await customerPage.getByLabel('Start', { exact: true }).fill(`${day}T09:00`);
    // The end follows from the start by the plan's estimated tunnel hours.
    await expect.poll(async () => (await customerPage.getByLabel('End', { exact: true }).inputValue()) > `${day}T09:00`).toBe(true);
    await customerPage.getByLabel('Article name').fill(article);
    await customerPage.getByRole('combobox', { name: 'Coefficients based on' }).focus();
    await customerPage.keyboard.press('Enter');
    await customerPage.getByRole('option', { name: 'Frontal area' }).click();
    await customerPage.getByLabel('Choose drawings or photos').setInputFiles([
      { name: 'notes.txt', mimeType: 'text/plain', buffer: Buffer.from('not a drawing') },
      { name: 'side-view.png', mimeType: 'image/png', buffer: drawing },
    ]);
    await customerPage.getByText('notes.txt: only PDF, PNG, JPEG, DWG and DXF files are accepted.').waitFor();
    await customerPage.getByRole('list', { name: 'Chosen files' }).getByText('side-view.png').waitFor();
    await customerPage.screenshot({ path: `${shots}/booking-request-attachments.png` });
    await customerPage.getByRole('button', { name: 'Send request' }).click();
    await customerPage.getByRole('heading', { name: 'My bookings', level: 1 }).waitFor();
    const customerCard = customerPage.locator('tw-booking-summary').filter({ hasText: article });
    await customerCard.getByRole('button', { name: 'Download side-view.png' }).waitFor();

    const managerPage = await suite.signedIn(manager.email);
    await openSection(managerPage, 'Bookings', 'Bookings');
    const managerCard = managerPage.locator('tw-booking-summary').filter({ hasText: article });
    await managerCard.getByText(/side-view\.png \(\d+ B\)/).waitFor();
    const download = managerPage.waitForEvent('download');
    await managerCard.getByRole('button', { name: 'Download side-view.png' }).click();
    expect((await download).suggestedFilename()).toBe('side-view.png');

    // Later, the customer adds a photo to the same booking from its card, and it stays after a reload.
    const laterPage = await suite.signedIn(customer.email);
    await openSection(laterPage, 'My bookings', 'My bookings');
    const laterCard = laterPage.locator('tw-booking-summary').filter({ hasText: article });
    await laterCard.getByRole('button', { name: 'Add drawings or photos' }).click();
    await laterCard.getByLabel('Choose drawings or photos').setInputFiles([{ name: 'rig-photo.png', mimeType: 'image/png', buffer: drawing }]);
    await laterCard.getByRole('status').getByText('Attached rig-photo.png.').waitFor();
    await laterCard.getByRole('button', { name: 'Download rig-photo.png' }).waitFor();
    await laterPage.screenshot({ path: `${shots}/booking-add-attachment.png` });
    await laterPage.reload();
    await laterPage.getByRole('heading', { name: 'My bookings', level: 1 }).waitFor();
    const reloadedCard = laterPage.locator('tw-booking-summary').filter({ hasText: article });
    await reloadedCard.getByRole('button', { name: 'Download side-view.png' }).waitFor();
    await reloadedCard.getByRole('button', { name: 'Download rig-photo.png' }).waitFor();
  });

  it('a lab manager presses Enter on a free stretch of next week and the maintenance form opens with that tunnel and period', async () => {
    const page = await suite.signedIn(demoUser('lab_manager').email);
    await openSection(page, 'Calendar', 'Calendar');
    await page.getByRole('table', { name: 'Calendar by tunnel' }).waitFor();
    await page.getByRole('button', { name: 'Later' }).click();
    // The demo lab keeps Europe/London time; the calendar's days are cut in it.
    const wednesday = DateTime.now().setZone('Europe/London').startOf('week').plus({ weeks: 1, days: 2 });
    const free = page.getByRole('button', { name: new RegExp(`^Use Tunnel 2 — open jet, ${wednesday.toFormat('ccc d LLL')}, .+ for the period$`) }).first();
    await free.focus();
    await page.screenshot({ path: `${shots}/lab-calendar-free-stretch.png` });
    await page.keyboard.press('Enter');
    const dialog = page.getByRole('dialog');
    await dialog.getByRole('heading', { name: 'Block a tunnel for maintenance' }).waitFor();
    await dialog.getByRole('combobox', { name: 'Tunnel' }).getByText('Tunnel 2 — open jet').waitFor();
    expect(await dialog.getByLabel('Start', { exact: true }).inputValue()).toMatch(new RegExp(`^${wednesday.toFormat('yyyy-LL-dd')}T\\d{2}:\\d{2}$`));
    expect((await dialog.getByLabel('End', { exact: true }).inputValue()) > (await dialog.getByLabel('Start', { exact: true }).inputValue())).toBe(true);
    await dialog.getByRole('button', { name: 'Close' }).click();
    await dialog.waitFor({ state: 'detached' });
  });

  it('a lab manager changes the hold length on the booking rules screen after confirming, then puts it back', async () => {
    const page = await suite.signedIn(demoUser('lab_manager').email);
    await openSection(page, 'Booking rules', 'Booking rules');
    const hold = page.getByLabel('Hold length (hours)');
    const original = await hold.inputValue();
    await hold.fill('0');
    await page.getByRole('button', { name: 'Save rules' }).click();
    await page.getByText('Between 1 and 1440 hours').waitFor();
    await hold.fill('36');
    await page.getByRole('button', { name: 'Save rules' }).click();
    await page.getByRole('dialog').getByText(`A provisional hold will last 36 hours instead of ${original} hours`).waitFor();
    await page.screenshot({ path: `${shots}/booking-rules-confirm.png` });
    await page.getByRole('dialog').getByRole('button', { name: 'Save rules' }).click();
    await page.getByText('Booking rules saved.').waitFor();
    await page.reload();
    await page.getByRole('heading', { name: 'Booking rules', level: 1 }).waitFor();
    await expect.poll(() => page.getByLabel('Hold length (hours)').inputValue()).toBe('36');
    await page.getByLabel('Hold length (hours)').fill(original);
    await page.getByRole('button', { name: 'Save rules' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Save rules' }).click();
    await page.getByText('Booking rules saved.').waitFor();
  });

  it('a lab manager blocks a tunnel for maintenance on the calendar after the form explains what is missing, then removes it after confirming', async () => {
    const reason = `Fan bearing inspection ${Date.now().toString(36)}`;
    const day = DateTime.now().plus({ days: 5 }).toFormat('yyyy-LL-dd');
    const page = await suite.signedIn(demoUser('lab_manager').email);
    await openSection(page, 'Calendar', 'Calendar');
    await page.getByRole('table', { name: 'Calendar by tunnel' }).waitFor();
    await page.getByText('Month', { exact: true }).click();
    await page.getByRole('table', { name: 'Calendar by day' }).waitFor();

    await page.getByRole('button', { name: 'Block a tunnel…' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByRole('button', { name: 'Block the tunnel' }).click();
    await dialog.getByText('Say what the maintenance is').waitFor();
    await dialog.getByRole('combobox', { name: 'Tunnel' }).click();
    await page.getByRole('option', { name: 'Tunnel 2 — open jet' }).click();
    await dialog.getByLabel('Start', { exact: true }).fill(`${day}T08:00`);
    await dialog.getByLabel('End', { exact: true }).fill(`${day}T12:00`);
    await dialog.getByLabel('What is the maintenance?').fill(reason);
    await dialog.getByRole('button', { name: 'Block the tunnel' }).click();
    await page.getByText('Tunnel blocked for maintenance.').waitFor();
    await page.getByRole('listitem').filter({ hasText: reason }).waitFor();

    await page.getByRole('button', { name: `Remove maintenance: ${reason}` }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Remove' }).click();
    await page.getByText('Maintenance block removed.').waitFor();
    await page.getByRole('listitem').filter({ hasText: reason }).waitFor({ state: 'detached' });
  });
});
