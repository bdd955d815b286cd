import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import type { QuoteInput } from '@tunnelwright/contracts';
import { QuoteEditor } from './quote-editor';
import { quoteTotalMinor } from './quote-totals';

async function open(): Promise<{ fixture: ComponentFixture<QuoteEditor>; loader: HarnessLoader; sent: QuoteInput[] }> {
  TestBed.configureTestingModule({ imports: [QuoteEditor] });
  const fixture = TestBed.createComponent(QuoteEditor);
  fixture.componentRef.setInput('currency', 'EUR');
  fixture.componentRef.setInput('hours', 8);
  fixture.componentRef.setInput('hourlyRateMinor', 15050);
  const sent: QuoteInput[] = [];
  fixture.componentInstance.quoteSubmitted.subscribe((quote) => sent.push(quote));
  await fixture.whenStable();
  return { fixture, loader: TestbedHarnessEnvironment.loader(fixture), sent };
}

const total = (fixture: ComponentFixture<QuoteEditor>) =>
  (fixture.nativeElement as HTMLElement).querySelector('[data-testid="quote-total"]')?.textContent?.trim();

async function inputs(loader: HarnessLoader, label: RegExp): Promise<MatInputHarness[]> {
  const fields = await loader.getAllHarnesses(MatFormFieldHarness.with({ floatingLabelText: label }));
  return Promise.all(fields.map(async (field) => (await field.getControl(MatInputHarness)) as MatInputHarness));
}

describe('quoteTotalMinor', () => {
  it('sums quantity × unit price exactly in minor units', () => {
    expect(quoteTotalMinor([{ quantity: 3, unitPriceMinor: 10 }, { quantity: 1, unitPriceMinor: 20 }])).toBe(50);
    expect(quoteTotalMinor([])).toBe(0);
  });
});

describe('QuoteEditor', () => {
  it('prefills the tunnel hours at the hourly rate and totals them', async () => {
    const { fixture } = await open();
    expect(total(fixture)).toBe('Total €1,204.00');
  });

  it('adds set-up and staff lines to the total without rounding drift', async () => {
    const { fixture, loader, sent } = await open();
    await (await loader.getHarness(MatButtonHarness.with({ text: /Add line/ }))).click();
    await (await loader.getHarness(MatButtonHarness.with({ text: /Add line/ }))).click();
    const kinds = await loader.getAllHarnesses(MatSelectHarness);
    await kinds[1]?.open();
    await kinds[1]?.clickOptions({ text: 'Set-up' });
    await kinds[2]?.open();
    await kinds[2]?.clickOptions({ text: 'Staff' });
    const quantities = await inputs(loader, /^Quantity/);
    const prices = await inputs(loader, /^Unit price/);
    await prices[1]?.setValue('0.10');
    await quantities[2]?.setValue('3');
    await prices[2]?.setValue('0.20');
    expect(total(fixture)).toBe('Total €1,204.70');

    await (await loader.getHarness(MatButtonHarness.with({ text: 'Send quote' }))).click();
    expect(sent).toEqual([
      {
        currency: 'EUR',
        note: '',
        lines: [
          { kind: 'tunnel_hours', description: '', quantity: 8, unitPriceMinor: 15050 },
          { kind: 'setup', description: '', quantity: 1, unitPriceMinor: 10 },
          { kind: 'staff', description: '', quantity: 3, unitPriceMinor: 20 },
        ],
      },
    ]);
  });

  it('refuses a fractional quantity and explains', async () => {
    const { fixture, loader, sent } = await open();
    const [quantity] = await inputs(loader, /^Quantity/);
    await quantity?.setValue('1.5');
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Send quote' }))).click();
    const field = await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: /^Quantity/ }));
    expect(await field.getTextErrors()).toEqual(['A whole number from 1 to 10,000']);
    expect(sent).toEqual([]);
    expect(total(fixture)).toBe('Total €0.00');
  });
});
