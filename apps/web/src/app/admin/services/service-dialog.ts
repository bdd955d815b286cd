import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { FormControl, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MAT_DIALOG_DATA } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type { Service, ServiceUnit, Tunnel } from '@tunnelwright/contracts';
import { CatalogueApi } from '../../core/catalogue-api';
import { fromMinorUnits, toMinorUnits } from '../../shared/money';
import { numberErrorText } from '../../shared/number-error-text';
import { serviceUnitLabels } from '../../shared/service-unit-labels';
import { FormDialogLayout } from '../../shared/form-dialog-layout';
import { FormSubmission } from '../../shared/form-submission';
import { NameField } from '../../shared/name-field';

/** What the service dialog needs: the service being edited (or null) and the tunnels it may be tied to. */
export interface ServiceDialogData {
  readonly service: Service | null;
  readonly tunnels: readonly Tunnel[];
  /** Currency a new service starts with: the one the lab's other services use. */
  readonly defaultCurrency?: string;
}

/** Creates or edits a service. The rate is typed as a decimal amount and sent as integer minor units. */
@Component({
  selector: 'tw-service-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule, MatSelectModule, FormDialogLayout, NameField],
  templateUrl: './service-dialog.html',
  styles: `
    .tw-form-grid {
      padding-top: 8px;
    }
    .wide {
      grid-column: 1 / -1;
    }
  `,
})
export class ServiceDialog {
  private readonly api = inject(CatalogueApi);
  private readonly data = inject<ServiceDialogData>(MAT_DIALOG_DATA);

  protected readonly service = this.data.service;
  protected readonly tunnels = this.data.tunnels;
  protected readonly units = Object.entries(serviceUnitLabels) as [ServiceUnit, string][];
  protected readonly numberError = numberErrorText;
  protected readonly form = inject(NonNullableFormBuilder).group({
    name: [this.service?.name ?? '', [Validators.required, Validators.maxLength(120)]],
    description: [this.service?.description ?? '', Validators.maxLength(2000)],
    unit: [this.service?.unit ?? ('hour' as ServiceUnit), Validators.required],
    rate: new FormControl<number | null>(
      this.service ? fromMinorUnits(this.service.rate, this.service.currency) : null,
      [Validators.required, Validators.min(0)],
    ),
    currency: [this.service?.currency ?? this.data.defaultCurrency ?? 'EUR', [Validators.required, Validators.pattern(/^[A-Z]{3}$/)]],
    tunnelId: new FormControl<string | null>(this.service?.tunnelId ?? null),
  });
  protected readonly submission = new FormSubmission(this.form, { failure: 'The service could not be saved.' });

  protected save(): void {
    this.form.controls.currency.setValue(this.form.controls.currency.value.trim().toUpperCase());
    if (!this.submission.checkValid()) {
      return;
    }
    const value = this.form.getRawValue();
    const input = {
      name: value.name.trim(),
      description: value.description.trim(),
      unit: value.unit,
      rate: toMinorUnits(value.rate ?? 0, value.currency),
      currency: value.currency,
      tunnelId: value.tunnelId,
    };
    this.submission.send(this.service ? this.api.updateService(this.service.id, input) : this.api.createService(input));
  }
}
