import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { AbstractControl, FormArray, FormControl, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MAT_DIALOG_DATA } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type { Balance, BalanceInput } from '@tunnelwright/contracts';
import { CatalogueApi } from '../../core/catalogue-api';
import { FormDialogLayout } from '../../shared/form-dialog-layout';
import { FormSubmission } from '../../shared/form-submission';
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
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule, MatSelectModule, FormDialogLayout],
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
  private readonly api = inject(BalancesApi);

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
  /** The API's complaints land on their fields; one about the capacities as a whole stays on the capacities array. */
  protected readonly submission = new FormSubmission(this.form, { failure: 'The balance could not be saved.' });

  protected save(): void {
    if (!this.submission.checkValid()) return;
    const value = this.form.getRawValue();
    const input: BalanceInput = { identifier: value.identifier.trim(), description: value.description.trim(), capacities: value.capacities.map((c) => c ?? 0), tunnelId: value.tunnelId };
    this.submission.send(this.balance ? this.api.updateBalance(this.balance.id, input) : this.api.createBalance(input));
  }
}
