import { ChangeDetectionStrategy, Component, computed, ElementRef, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { AbstractControl, FormArray, FormControl, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import type { Balance, BalanceInput } from '@tunnelwright/contracts';
import { CatalogueApi } from '../../core/catalogue-api';
import { problemFieldErrors, problemMessage } from '../../core/problem-message';
import { ErrorBanner } from '../../shared/error-banner';
import { focusFirstInvalid } from '../../shared/focus-first-invalid';
import { positiveNumber } from '../../shared/positive-number';
import { BalancesApi } from './balances-api';
import { loadComponents } from './calibration-matrix';

/** Label of each capacity field, with its unit: forces in N, moments in N·m. */
export const capacityLabels = loadComponents.map((component) => `${component} capacity (${capacityUnit(component)})`);

/** The unit of a component's capacity and load: N for the forces, N·m for the moments. */
export function capacityUnit(component: string): string {
  return component.startsWith('F') ? 'N' : 'N·m';
}

/** What is wrong with a capacity field, e.g. "Enter the Fx capacity"; empty when it is fine. */
export function capacityError(control: AbstractControl, index: number): string {
  const name = `${loadComponents[index]} capacity`;
  if (control.hasError('server')) return String(control.getError('server'));
  if (control.hasError('required')) return `Enter the ${name}`;
  if (control.hasError('positive')) return `${name} must be greater than zero`;
  return control.errors ? `Check the ${name}` : '';
}

/** Adds a balance, or edits the one passed in. Closes with the saved balance. */
@Component({
  selector: 'tw-balance-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatButtonModule, MatProgressBarModule, ErrorBanner],
  templateUrl: './balance-dialog.html',
  styles: `
    .tw-form-grid {
      padding-top: 8px;
    }
    .wide {
      grid-column: 1 / -1;
    }
    .section {
      font: var(--mat-sys-title-small);
      margin: 8px 0 4px;
    }
    .form-error {
      color: var(--mat-sys-error);
      font: var(--mat-sys-body-small);
      margin: 0 0 8px;
    }
  `,
})
export class BalanceDialog {
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly api = inject(BalancesApi);
  private readonly dialogRef = inject<MatDialogRef<BalanceDialog, Balance>>(MatDialogRef);

  /** The balance being edited, or null for a new one. */
  protected readonly balance = inject<Balance | null>(MAT_DIALOG_DATA, { optional: true });
  protected readonly form = inject(NonNullableFormBuilder).group({
    identifier: [this.balance?.identifier ?? '', [Validators.required, Validators.maxLength(80)]],
    description: [this.balance?.description ?? '', Validators.maxLength(2000)],
    tunnelId: new FormControl<string | null>(this.balance?.tunnelId ?? null),
    capacities: new FormArray(
      loadComponents.map((_, index) => new FormControl<number | null>(this.balance?.capacities[index] ?? null, { validators: [Validators.required, positiveNumber] })),
    ),
  });
  private readonly catalogue = inject(CatalogueApi);
  /** The tunnels of the live catalogue, which a balance can be installed in. */
  private readonly tunnelList = rxResource({ stream: () => this.catalogue.tunnels() });
  protected readonly tunnels = computed(() => (this.tunnelList.hasValue() ? this.tunnelList.value() : []));
  protected readonly capacityLabels = capacityLabels;
  protected readonly capacityError = capacityError;
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);
  /** The API's complaint about the capacities as a whole, e.g. that one is not above zero. */
  protected readonly capacitiesError = signal<string | null>(null);

  protected save(): void {
    this.capacitiesError.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    const value = this.form.getRawValue();
    const input: BalanceInput = { identifier: value.identifier.trim(), description: value.description.trim(), capacities: value.capacities.map((c) => c ?? 0), tunnelId: value.tunnelId };
    this.busy.set(true);
    this.error.set(null);
    const request = this.balance ? this.api.updateBalance(this.balance.id, input) : this.api.createBalance(input);
    request.subscribe({
      next: (saved) => {
        this.busy.set(false);
        this.dialogRef.close(saved);
      },
      error: (error: unknown) => {
        this.busy.set(false);
        for (const field of problemFieldErrors(error)) {
          if (field.field === 'capacities') {
            this.capacitiesError.set(field.message);
            continue;
          }
          const control = this.form.get(field.field);
          control?.setErrors({ server: field.message });
          control?.markAsTouched();
        }
        this.error.set(problemMessage(error, 'The balance could not be saved.'));
      },
    });
  }
}
