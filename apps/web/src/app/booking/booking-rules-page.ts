import { ChangeDetectionStrategy, Component, ElementRef, computed, effect, inject, linkedSignal, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import type { BookingSettings } from '@tunnelwright/contracts';
import { problemFieldErrors, problemMessage } from '../core/problem-message';
import { ConfirmDialog, ConfirmDialogData } from '../shared/confirm-dialog';
import { ErrorBanner } from '../shared/error-banner';
import { focusFirstInvalid } from '../shared/focus-first-invalid';
import { BookingApi } from './booking-api';
import { bookingRuleLimits, bookingRulesForm, bookingRulesOf, describeRuleChanges, ruleErrorText } from './booking-rules-form';

/** Only the rules of an answer that also carries the lab's zone. */
function rulesOf({ holdHours, lateCancellationDays, lateCancellationPercent }: BookingSettings): BookingSettings {
  return { holdHours, lateCancellationDays, lateCancellationPercent };
}

/** Lab managers set how long provisional holds last and what a late cancellation costs; each change is audited. */
@Component({
  selector: 'tw-booking-rules-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, RouterLink, MatFormFieldModule, MatInputModule, MatButtonModule, MatProgressBarModule, ErrorBanner],
  template: `
    <section class="tw-page">
      <header class="tw-page-header">
        <h1>Booking rules</h1>
        <a mat-button routerLink="/admin/audit">Audit log</a>
      </header>
      @if (loadError(); as message) {
        <tw-error-banner [message]="message" (retry)="settings.reload()" />
      }
      @if (settings.isLoading()) {
        <mat-progress-bar mode="indeterminate" aria-label="Loading the booking rules" />
      }
      @if (settings.hasValue()) {
        <form [formGroup]="form" (ngSubmit)="save()" novalidate aria-label="Booking rules">
          <fieldset>
            <legend>Provisional holds</legend>
            <p class="hint">A request, a quote or a period offered instead keeps its slot for this long; unanswered, it expires and the slot is free again.</p>
            <mat-form-field>
              <mat-label>Hold length (hours)</mat-label>
              <input matInput type="number" formControlName="holdHours" [min]="limits.holdHours.min" [max]="limits.holdHours.max" step="1" required />
              <mat-hint>{{ limits.holdHours.min }} to {{ limits.holdHours.max }} hours</mat-hint>
              @if (form.controls.holdHours.invalid) {
                <mat-error>{{ errorText('holdHours') }}</mat-error>
              }
            </mat-form-field>
          </fieldset>
          <fieldset>
            <legend>Late cancellation</legend>
            <p class="hint">A customer who cancels a confirmed booking this close to its start pays this share of the accepted quote. Cancellations by the lab cost nothing.</p>
            <div class="row">
              <mat-form-field>
                <mat-label>Days before the start</mat-label>
                <input matInput type="number" formControlName="lateCancellationDays" [min]="limits.lateCancellationDays.min" [max]="limits.lateCancellationDays.max" step="1" required />
                <mat-hint>0 to {{ limits.lateCancellationDays.max }} days</mat-hint>
                @if (form.controls.lateCancellationDays.invalid) {
                  <mat-error>{{ errorText('lateCancellationDays') }}</mat-error>
                }
              </mat-form-field>
              <mat-form-field>
                <mat-label>Charge (% of the quote)</mat-label>
                <input matInput type="number" formControlName="lateCancellationPercent" min="0" max="100" step="1" required />
                <mat-hint>0 charges nothing</mat-hint>
                @if (form.controls.lateCancellationPercent.invalid) {
                  <mat-error>{{ errorText('lateCancellationPercent') }}</mat-error>
                }
              </mat-form-field>
            </div>
          </fieldset>
          <p class="hint">Times are the lab's local time ({{ settings.value().timeZone }}).</p>
          @if (saveError(); as message) {
            <tw-error-banner [message]="message" [retryable]="false" />
          }
          <div class="actions">
            <button mat-flat-button type="submit" [disabled]="saving()">Save rules</button>
            <button mat-button type="button" [disabled]="saving() || !dirty()" (click)="reset()">Undo changes</button>
          </div>
        </form>
      }
    </section>
  `,
  styles: `
    form {
      display: flex;
      flex-direction: column;
      gap: 4px;
      max-width: 720px;
    }
    fieldset {
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: var(--mat-sys-corner-small);
      padding: 8px 16px;
      margin: 0 0 12px;
    }
    .row {
      display: flex;
      flex-wrap: wrap;
      gap: 12px;
    }
    .row > mat-form-field {
      flex: 1 1 220px;
    }
    .hint {
      color: var(--mat-sys-on-surface-variant);
      margin: 0 0 8px;
    }
    .actions {
      display: flex;
      gap: 8px;
    }
  `,
})
export class BookingRulesPage {
  private readonly api = inject(BookingApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  protected readonly limits = bookingRuleLimits;
  protected readonly form = bookingRulesForm();
  protected readonly settings = rxResource({ stream: () => this.api.settings() });
  protected readonly loadError = computed(() => {
    const error = this.settings.error();
    return error ? problemMessage(error.cause ?? error, 'The booking rules could not be loaded.') : null;
  });
  protected readonly saving = signal(false);
  protected readonly saveError = signal<string | null>(null);
  /** The rules as the API last answered; what the form is compared with and reset to. */
  private readonly saved = linkedSignal<BookingSettings | null>(() => (this.settings.hasValue() ? rulesOf(this.settings.value()) : null));
  protected readonly dirty = signal(false);

  constructor() {
    effect(() => {
      const saved = this.saved();
      if (saved) this.fill(saved);
    });
    this.form.valueChanges.subscribe(() => this.dirty.set(this.form.dirty));
  }

  protected errorText(name: keyof typeof bookingRuleLimits): string {
    return ruleErrorText(this.form, name);
  }

  protected reset(): void {
    const saved = this.saved();
    if (saved) this.fill(saved);
  }

  /** Checks the form, says what the change means and when it takes effect, and saves only once confirmed. */
  protected save(): void {
    const before = this.saved();
    if (this.form.invalid || !before) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    const after = bookingRulesOf(this.form);
    const changes = describeRuleChanges(before, after);
    if (changes.length === 0) {
      this.snackBar.open('Nothing has changed; the rules stay as they are.', undefined, { duration: 4000 });
      return;
    }
    const data: ConfirmDialogData = { title: 'Change the booking rules?', message: changes.join(' '), confirmLabel: 'Save rules' };
    this.dialog
      .open(ConfirmDialog, { data, width: '520px' })
      .afterClosed()
      .subscribe((confirmed: boolean | undefined) => {
        if (confirmed) this.send(after);
      });
  }

  private send(rules: BookingSettings): void {
    this.saving.set(true);
    this.saveError.set(null);
    this.api.saveSettings(rules).subscribe({
      next: (answer) => {
        this.saving.set(false);
        this.saved.set(rulesOf(answer));
        this.snackBar.open('Booking rules saved.', undefined, { duration: 4000 });
      },
      error: (error: unknown) => {
        this.saving.set(false);
        for (const field of problemFieldErrors(error)) {
          const control = this.form.get(field.field);
          if (control) {
            control.setErrors({ server: field.message });
            control.markAsTouched();
          }
        }
        this.saveError.set(problemMessage(error, 'The booking rules could not be saved.'));
      },
    });
  }

  private fill(rules: BookingSettings): void {
    this.form.reset(rules);
    this.dirty.set(false);
  }
}
