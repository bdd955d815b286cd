import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { ChangeDetectionStrategy, Component, signal } from '@angular/core';
import { FormGroup } from '@angular/forms';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatDialogRef } from '@angular/material/dialog';
import { MatProgressBarHarness } from '@angular/material/progress-bar/testing';
import { ErrorBanner } from './error-banner';
import { Subject, throwError } from 'rxjs';
import { FormDialogLayout } from './form-dialog-layout';
import { FormSubmission } from './form-submission';

/** A dialog as the catalogue and invitation dialogs are: a projected form, and a banner of its own. */
@Component({
  selector: 'tw-form-dialog-layout-host',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [FormDialogLayout, ErrorBanner],
  template: `
    <tw-form-dialog-layout
      title="New balance"
      formId="balance-form"
      submitLabel="Create balance"
      [submission]="submission"
      [loading]="loading()"
      [progressLabel]="progressLabel()"
    >
      @if (notice(); as message) {
        <tw-error-banner [message]="message" />
      }
      <form id="balance-form" (submit)="$event.preventDefault(); submitted = submitted + 1"><input aria-label="Serial" /></form>
    </tw-form-dialog-layout>
  `,
})
class FormDialogLayoutHost {
  readonly submission = new FormSubmission(new FormGroup({}), { failure: 'The balance could not be saved.' });
  readonly loading = signal(false);
  readonly progressLabel = signal('Saving');
  readonly notice = signal<string | null>(null);
  submitted = 0;
}

describe('FormDialogLayout', () => {
  let fixture: ComponentFixture<FormDialogLayoutHost>;

  beforeEach(async () => {
    TestBed.configureTestingModule({ providers: [{ provide: MatDialogRef, useValue: { close: vi.fn() } }] });
    fixture = TestBed.createComponent(FormDialogLayoutHost);
    await fixture.whenStable();
  });

  const loader = () => TestbedHarnessEnvironment.loader(fixture);
  const element = () => fixture.nativeElement as HTMLElement;
  const submit = () => loader().getHarness(MatButtonHarness.with({ text: 'Create balance' }));
  const set = async (change: (host: FormDialogLayoutHost) => void) => {
    change(fixture.componentInstance);
    await fixture.whenStable();
  };

  it('shows the title and the projected form, with Cancel beside a button that sends that form', async () => {
    expect(element().querySelector('h2')?.textContent).toBe('New balance');
    expect(element().querySelector('mat-dialog-content input[aria-label="Serial"]')).not.toBeNull();
    expect(await loader().getHarness(MatButtonHarness.with({ text: 'Cancel' }))).toBeTruthy();
    expect(await (await submit()).getType()).toBe('submit');
    await (await submit()).click();
    expect(fixture.componentInstance.submitted).toBe(1);
  });

  it('shows no progress bar and no message while nothing happens', async () => {
    expect(await loader().getAllHarnesses(MatProgressBarHarness)).toHaveLength(0);
    expect(element().querySelector('[role="alert"]')).toBeNull();
  });

  it('turns the submit button off and says it is saving while the form is sent', async () => {
    await set((host) => host.submission.send(new Subject<never>()));
    expect(await (await submit()).isDisabled()).toBe(true);
    expect(element().querySelector('mat-progress-bar')?.getAttribute('aria-label')).toBe('Saving');
  });

  it('shows progress under its own label while something the form needs loads, with the button still on', async () => {
    await set((host) => {
      host.loading.set(true);
      host.progressLabel.set('Working');
    });
    expect(await (await submit()).isDisabled()).toBe(false);
    expect(element().querySelector('mat-progress-bar')?.getAttribute('aria-label')).toBe('Working');
  });

  it('shows why sending failed without a retry, below a banner the dialog projects', async () => {
    await set((host) => {
      host.notice.set('The organisations could not be loaded.');
      host.submission.send(throwError(() => new Error('socket closed')));
    });
    const banners = [...element().querySelectorAll('mat-dialog-content [role="alert"]')].map((banner) => banner.textContent);
    expect(banners).toHaveLength(2);
    expect(banners[0]).toContain('The organisations could not be loaded.');
    expect(banners[0]).toContain('Try again');
    expect(banners[1]).toContain('The balance could not be saved.');
    expect(banners[1]).not.toContain('Try again');
  });
});
