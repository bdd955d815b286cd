import { ElementRef, inject, signal } from '@angular/core';
import type { AbstractControl } from '@angular/forms';
import type { Observable } from 'rxjs';
import { problemMessage } from '../core/problem-message';
import { focusFirstInvalid } from './focus-first-invalid';

/**
 * Sending the form of a page: refused while invalid, with every message shown and the focus on the first bad field;
 * busy while the request runs; on a failure, the page's own words for it. Create it in a field initialiser of the
 * page, where `inject` works.
 */
export class PageSubmission {
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  /** Whether the request is under way. */
  readonly busy = signal(false);
  /** Why the last request failed, or null. */
  readonly error = signal<string | null>(null);

  /**
   * @param form the page's form, checked before anything is sent
   * @param describe the words for a failed request; by default the API's own message
   */
  constructor(
    private readonly form: AbstractControl,
    private readonly describe: (error: unknown) => string = (error) => problemMessage(error),
  ) {}

  /** Once the form is valid, sends what `request` makes and hands the answer to `done`, the page no longer busy. */
  send<A>(request: () => Observable<A>, done: (answer: A) => void): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    this.busy.set(true);
    this.error.set(null);
    request().subscribe({
      next: (answer) => {
        this.busy.set(false);
        done(answer);
      },
      error: (error: unknown) => {
        this.busy.set(false);
        this.error.set(this.describe(error));
      },
    });
  }
}
