import { HttpErrorResponse } from '@angular/common/http';
import { ChangeDetectionStrategy, Component } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatDialogRef } from '@angular/material/dialog';
import { of, Subject, throwError } from 'rxjs';
import { FormSubmission } from './form-submission';

/** A dialog with two fields, one of them nested as the API names it differently. */
@Component({
  selector: 'tw-form-submission-host',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule],
  template: `
    <form [formGroup]="form">
      <input formControlName="serial" aria-label="Serial" />
      <input formControlName="components" aria-label="Components" />
    </form>
  `,
})
class FormSubmissionHost {
  readonly form = new FormGroup({
    serial: new FormControl('', { nonNullable: true, validators: Validators.required }),
    components: new FormControl<number | null>(6, Validators.required),
  });
  readonly submission = new FormSubmission(this.form, {
    failure: 'The balance could not be saved.',
    controlPath: (field) => field.replace(/^layout\./, ''),
  });
}

describe('FormSubmission', () => {
  let fixture: ComponentFixture<FormSubmissionHost>;
  let host: FormSubmissionHost;
  const close = vi.fn();

  beforeEach(async () => {
    close.mockReset();
    TestBed.configureTestingModule({ providers: [{ provide: MatDialogRef, useValue: { close } }] });
    fixture = TestBed.createComponent(FormSubmissionHost);
    host = fixture.componentInstance;
    await fixture.whenStable();
  });

  it('refuses an invalid form, showing every message and focusing the first bad field', async () => {
    host.form.controls.components.setValue(null);
    await fixture.whenStable();
    expect(host.submission.checkValid()).toBe(false);
    expect(host.form.controls.serial.touched).toBe(true);
    expect(host.form.controls.components.touched).toBe(true);
    expect(document.activeElement?.getAttribute('aria-label')).toBe('Serial');
  });

  it('lets a valid form through', () => {
    host.form.controls.serial.setValue('B-104');
    expect(host.submission.checkValid()).toBe(true);
  });

  it('is sending until the answer comes, then closes the dialog with it', () => {
    const answer = new Subject<{ id: string }>();
    host.submission.send(answer);
    expect(host.submission.sending()).toBe(true);
    answer.next({ id: 'b1' });
    expect(host.submission.sending()).toBe(false);
    expect(close).toHaveBeenCalledWith({ id: 'b1' });
  });

  it('closes with what the dialog makes of the answer when asked to', () => {
    host.submission.send(of(null), () => 'B-104');
    expect(close).toHaveBeenCalledWith('B-104');
  });

  it('puts the API’s complaints under their fields and its message in the dialog, and stays open', () => {
    const refusal = new HttpErrorResponse({
      status: 400,
      error: {
        title: 'Invalid input',
        detail: 'Some fields need attention.',
        errors: [
          { field: 'serial', message: 'This serial is already in use' },
          { field: 'layout.components', message: 'Use 3 or 6 components' },
        ],
      },
    });
    host.submission.send(throwError(() => refusal));
    expect(host.submission.sending()).toBe(false);
    expect(close).not.toHaveBeenCalled();
    expect(host.form.controls.serial.getError('server')).toBe('This serial is already in use');
    expect(host.form.controls.components.getError('server')).toBe('Use 3 or 6 components');
    expect(host.form.controls.components.touched).toBe(true);
    expect(host.submission.error()).toBe('Some fields need attention.');
  });

  it('falls back on its own message when the API says nothing', () => {
    host.submission.send(throwError(() => new Error('socket closed')));
    expect(host.submission.error()).toBe('The balance could not be saved.');
  });
});
