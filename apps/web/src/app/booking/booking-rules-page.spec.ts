import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { MatDialogHarness } from '@angular/material/dialog/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { provideRouter } from '@angular/router';
import { describeRuleChanges } from './booking-rules-form';
import { BookingRulesPage } from './booking-rules-page';

const current = { holdHours: 48, lateCancellationDays: 7, lateCancellationPercent: 50, timeZone: 'Europe/London' };

async function open(): Promise<{ loader: HarnessLoader; root: HarnessLoader; backend: HttpTestingController; text: () => string; settle: () => Promise<void> }> {
  TestBed.configureTestingModule({ imports: [BookingRulesPage], providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([]), { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } }] });
  const fixture = TestBed.createComponent(BookingRulesPage);
  fixture.detectChanges();
  const backend = TestBed.inject(HttpTestingController);
  backend.expectOne('/api/bookings/settings').flush(current);
  await fixture.whenStable();
  return {
    loader: TestbedHarnessEnvironment.loader(fixture),
    root: TestbedHarnessEnvironment.documentRootLoader(fixture),
    backend,
    text: () => document.body.textContent ?? '',
    settle: () => fixture.whenStable(),
  };
}

const field = (loader: HarnessLoader, label: RegExp) => loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }));
const input = async (loader: HarnessLoader, label: RegExp) => (await (await field(loader, label)).getControl(MatInputHarness)) as MatInputHarness;
const save = async (loader: HarnessLoader) => (await loader.getHarness(MatButtonHarness.with({ text: 'Save rules' }))).click();
const isPut = (backend: HttpTestingController) => backend.match((request) => request.method === 'PUT');
/** Confirms the dialog and lets the page hear the answer. */
const confirm = async (root: HarnessLoader, settle: () => Promise<void>) => {
  await (await root.getHarness(MatButtonHarness.with({ text: 'Save rules', ancestor: 'mat-dialog-actions' }))).click();
  await settle();
};

describe('BookingRulesPage', () => {
  it('shows the lab’s current rules and zone', async () => {
    const { loader, text } = await open();
    expect(await (await input(loader, /^Hold length/)).getValue()).toBe('48');
    expect(await (await input(loader, /^Days before the start/)).getValue()).toBe('7');
    expect(await (await input(loader, /^Charge/)).getValue()).toBe('50');
    expect(text()).toContain('Europe/London');
  });

  it('says what is wrong with each value and sends nothing', async () => {
    const { loader, backend } = await open();
    await (await input(loader, /^Hold length/)).setValue('0');
    await (await input(loader, /^Days before the start/)).setValue('');
    await (await input(loader, /^Charge/)).setValue('12.5');
    await save(loader);
    expect(await (await field(loader, /^Hold length/)).getTextErrors()).toEqual(['Between 1 and 1440 hours']);
    expect(await (await field(loader, /^Days before the start/)).getTextErrors()).toEqual(['Enter how many days before the start the rule begins']);
    expect(await (await field(loader, /^Charge/)).getTextErrors()).toEqual(['Use a whole percentage']);
    await (await input(loader, /^Charge/)).setValue('101');
    expect(await (await field(loader, /^Charge/)).getTextErrors()).toEqual(['Between 0 and 100 %']);
    expect(isPut(backend)).toEqual([]);
  });

  it('asks first, saying when the change takes effect, and sends nothing when the lab manager steps back', async () => {
    const { loader, root, backend } = await open();
    await (await input(loader, /^Hold length/)).setValue('24');
    await save(loader);
    const dialog = await root.getHarness(MatDialogHarness);
    expect(await dialog.getTitleText()).toBe('Change the booking rules?');
    expect(await dialog.getContentText()).toBe('A provisional hold will last 24 hours instead of 48 hours, for holds started or renewed from now on; holds already running keep their end.');
    await (await root.getHarness(MatButtonHarness.with({ text: 'Cancel' }))).click();
    expect(isPut(backend)).toEqual([]);
  });

  it('saves the confirmed rules as whole numbers and keeps them as the new baseline', async () => {
    const { loader, root, backend, text, settle } = await open();
    await (await input(loader, /^Days before the start/)).setValue('14');
    await (await input(loader, /^Charge/)).setValue('25');
    await save(loader);
    const dialog = await root.getHarness(MatDialogHarness);
    expect(await dialog.getContentText()).toContain('25 % of the accepted quote when a customer cancels a confirmed booking within 14 days of its start, instead of 50 % of the accepted quote when a customer cancels a confirmed booking within 7 days of its start');
    expect(await dialog.getContentText()).toContain('including bookings already confirmed');
    await confirm(root, settle);
    const put = backend.expectOne('/api/bookings/settings');
    expect(put.request.method).toBe('PUT');
    expect(put.request.body).toEqual({ holdHours: 48, lateCancellationDays: 14, lateCancellationPercent: 25 });
    put.flush({ holdHours: 48, lateCancellationDays: 14, lateCancellationPercent: 25, timeZone: 'Europe/London' });
    expect(text()).toContain('Booking rules saved.');
    // Saving the same values again changes nothing, so nothing is asked or sent.
    await save(loader);
    expect(await root.getAllHarnesses(MatDialogHarness)).toHaveLength(0);
    expect(isPut(backend)).toEqual([]);
  });

  it('puts a field error from the API under its field', async () => {
    const { loader, root, backend, settle } = await open();
    await (await input(loader, /^Hold length/)).setValue('72');
    await save(loader);
    await confirm(root, settle);
    backend
      .expectOne('/api/bookings/settings')
      .flush({ title: 'Invalid request', detail: 'Check the highlighted fields.', errors: [{ field: 'holdHours', message: 'A hold lasts at most 1440 hours' }] }, { status: 400, statusText: 'Bad Request' });
    expect(await (await field(loader, /^Hold length/)).getTextErrors()).toEqual(['A hold lasts at most 1440 hours']);
  });
});

describe('describeRuleChanges', () => {
  it('names nothing when nothing changed, and a zero charge as no charge', () => {
    const rules = { holdHours: 48, lateCancellationDays: 7, lateCancellationPercent: 50 };
    expect(describeRuleChanges(rules, { ...rules })).toEqual([]);
    expect(describeRuleChanges(rules, { ...rules, lateCancellationPercent: 0 })).toEqual([
      'Late cancellation will cost nothing, instead of 50 % of the accepted quote when a customer cancels a confirmed booking within 7 days of its start. This applies to every cancellation from now on, including bookings already confirmed.',
    ]);
  });
});
