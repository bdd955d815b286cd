import { HttpClient, provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { MatDialog } from '@angular/material/dialog';
import { MatDialogHarness } from '@angular/material/dialog/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { openReasonDialog } from './reason-dialog';

interface Withdrawn {
  readonly id: string;
  readonly reason: string;
}

/** A page with one act that needs a reason, opening the dialog as the real pages do. */
@Component({
  selector: 'tw-quote-host',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `<button type="button" (click)="withdraw()">Withdraw</button>`,
})
class QuoteHost {
  private readonly dialog = inject(MatDialog);
  private readonly http = inject(HttpClient);
  readonly closedWith: (Withdrawn | undefined)[] = [];

  withdraw(): void {
    openReasonDialog(this.dialog, {
      title: 'Withdraw quote Q-17?',
      message: 'The customer sees the quote as withdrawn.',
      missingReason: 'Say why the quote is withdrawn',
      cancelLabel: 'Keep the quote',
      confirmLabel: 'Withdraw quote',
      destructive: true,
      send: (reason) => this.http.post<Withdrawn>('/api/quotes/q-17/withdraw', { reason }),
      failure: 'The quote could not be withdrawn.',
    }).subscribe((result) => this.closedWith.push(result));
  }
}

describe('openReasonDialog', () => {
  let backend: HttpTestingController;
  let fixture: ComponentFixture<QuoteHost>;
  let closedWith: (Withdrawn | undefined)[];

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [provideHttpClient(), provideHttpClientTesting(), { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } }],
    });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(QuoteHost);
    closedWith = fixture.componentInstance.closedWith;
  });

  afterEach(() => backend.verify());

  async function parts() {
    (fixture.nativeElement as HTMLElement).querySelector('button')?.click();
    await fixture.whenStable();
    const root = TestbedHarnessEnvironment.documentRootLoader(fixture);
    const dialog = await root.getHarness(MatDialogHarness);
    const field = await dialog.getHarness(MatFormFieldHarness.with({ floatingLabelText: /^Reason/ }));
    const input = (await field.getControl(MatInputHarness)) as MatInputHarness;
    const confirm = await dialog.getHarness(MatButtonHarness.with({ text: 'Withdraw quote' }));
    return { dialog, field, input, confirm };
  }

  it('sends nothing until the reason has 10 characters, and says what is missing', async () => {
    const { dialog, field, input, confirm } = await parts();
    expect(await dialog.getTitleText()).toBe('Withdraw quote Q-17?');
    expect(await (await dialog.getHarness(MatButtonHarness.with({ text: 'Keep the quote' }))).isDisabled()).toBe(false);

    await confirm.click();
    expect(await field.getTextErrors()).toEqual(['Say why the quote is withdrawn']);
    await input.setValue('   Too late  ');
    await confirm.click();
    expect(await field.getTextErrors()).toEqual(['Write at least 10 characters']);
    backend.expectNone('/api/quotes/q-17/withdraw');
  });

  it('sends the trimmed reason and closes with what the API returned', async () => {
    const { field, input, confirm } = await parts();
    await input.setValue('  Tunnel booked for repairs  ');
    expect(await field.getTextHints()).toEqual(['25 / at least 10']);
    await confirm.click();
    const request = backend.expectOne('/api/quotes/q-17/withdraw');
    expect(request.request.body).toEqual({ reason: 'Tunnel booked for repairs' });
    request.flush({ id: 'q-17', reason: 'Tunnel booked for repairs' });
    for (let tick = 0; tick < 100 && closedWith.length === 0; tick++) {
      await new Promise((resolve) => setTimeout(resolve, 10));
    }
    expect(closedWith).toEqual([{ id: 'q-17', reason: 'Tunnel booked for repairs' }]);
  });

  it('stays open on a refusal, with the complaint about the reason under the field', async () => {
    const { dialog, field, input, confirm } = await parts();
    await input.setValue('Tunnel booked for repairs');
    await confirm.click();
    backend
      .expectOne('/api/quotes/q-17/withdraw')
      .flush(
        { title: 'Some fields need attention', status: 400, detail: 'Check the reason.', errors: [{ field: 'reason', message: 'A reason must not name a person' }] },
        { status: 400, statusText: 'Bad Request' },
      );
    expect(await field.getTextErrors()).toEqual(['A reason must not name a person']);
    expect(await dialog.getText()).toContain('Check the reason.');
    expect(await confirm.isDisabled()).toBe(false);
    expect(closedWith).toEqual([]);
  });
});
