import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MAT_DIALOG_DATA } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type { Tunnel, TunnelKind } from '@tunnelwright/contracts';
import { CatalogueApi } from '../../core/catalogue-api';
import { numberErrorText } from '../../shared/number-error-text';
import { tunnelKindLabels } from '../../shared/tunnel-kind-labels';
import { FormDialogLayout } from '../../shared/form-dialog-layout';
import { FormSubmission } from '../../shared/form-submission';
import { NameField } from '../../shared/name-field';
import { buildTunnelForm, tunnelInputFrom } from './tunnel-form';

/** Creates a tunnel, or edits the one passed in. Closes with the saved tunnel. */
@Component({
  selector: 'tw-tunnel-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    MatCheckboxModule,
    MatButtonModule,
    FormDialogLayout,
    NameField,
  ],
  templateUrl: './tunnel-dialog.html',
  styles: `
    .section {
      font: var(--mat-sys-title-small);
      margin: 8px 0 4px;
    }
    .tw-form-grid {
      padding-top: 8px;
    }
    .wide {
      grid-column: 1 / -1;
    }
    .form-error {
      color: var(--mat-sys-error);
      font: var(--mat-sys-body-small);
      margin: 0 0 8px;
    }
  `,
})
export class TunnelDialog {
  private readonly api = inject(CatalogueApi);

  /** The tunnel being edited, or null for a new one. */
  protected readonly tunnel = inject<Tunnel | null>(MAT_DIALOG_DATA, { optional: true });
  protected readonly form = buildTunnelForm(inject(NonNullableFormBuilder), this.tunnel ?? undefined);
  protected readonly kinds = Object.entries(tunnelKindLabels) as [TunnelKind, string][];
  protected readonly numberError = numberErrorText;
  protected readonly submission = new FormSubmission(this.form, {
    failure: 'The tunnel could not be saved.',
    // The API names capability fields by their place in the tunnel; the form keeps them at the top level.
    controlPath: (field) => field.replace(/^capabilities\./, ''),
  });

  /** Fills the area from width × height, the usual case without corner fillets. */
  protected useRectangularArea(): void {
    const { width, height } = this.form.getRawValue();
    if (width && height) {
      this.form.controls.area.setValue(Math.round(width * height * 1e6) / 1e6);
      this.form.controls.area.markAsTouched();
    }
  }

  protected save(): void {
    if (!this.submission.checkValid()) {
      return;
    }
    const input = tunnelInputFrom(this.form, this.tunnel ?? undefined);
    this.submission.send(this.tunnel ? this.api.updateTunnel(this.tunnel.id, input) : this.api.createTunnel(input));
  }
}
