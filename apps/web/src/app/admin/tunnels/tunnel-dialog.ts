import { ChangeDetectionStrategy, Component, ElementRef, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import type { Tunnel, TunnelKind } from '@tunnelwright/contracts';
import { CatalogueApi } from '../../core/catalogue-api';
import { problemFieldErrors, problemMessage } from '../../core/problem-message';
import { ErrorBanner } from '../../shared/error-banner';
import { numberErrorText } from '../../shared/number-error-text';
import { tunnelKindLabels } from '../../shared/tunnel-kind-labels';
import { buildTunnelForm, tunnelInputFrom } from './tunnel-form';
import { focusFirstInvalid } from '../../shared/focus-first-invalid';

/** Creates a tunnel, or edits the one passed in. Closes with the saved tunnel. */
@Component({
  selector: 'tw-tunnel-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    MatDialogModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    MatCheckboxModule,
    MatButtonModule,
    MatProgressBarModule,
    ErrorBanner,
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
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly api = inject(CatalogueApi);
  private readonly dialogRef = inject<MatDialogRef<TunnelDialog, Tunnel>>(MatDialogRef);

  /** The tunnel being edited, or null for a new one. */
  protected readonly tunnel = inject<Tunnel | null>(MAT_DIALOG_DATA, { optional: true });
  protected readonly form = buildTunnelForm(inject(NonNullableFormBuilder), this.tunnel ?? undefined);
  protected readonly kinds = Object.entries(tunnelKindLabels) as [TunnelKind, string][];
  protected readonly numberError = numberErrorText;
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);

  /** Fills the area from width × height, the usual case without corner fillets. */
  protected useRectangularArea(): void {
    const { width, height } = this.form.getRawValue();
    if (width && height) {
      this.form.controls.area.setValue(Math.round(width * height * 1e6) / 1e6);
      this.form.controls.area.markAsTouched();
    }
  }

  protected save(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    const input = tunnelInputFrom(this.form, this.tunnel ?? undefined);
    this.busy.set(true);
    this.error.set(null);
    const request = this.tunnel ? this.api.updateTunnel(this.tunnel.id, input) : this.api.createTunnel(input);
    request.subscribe({
      next: (saved) => {
        this.busy.set(false);
        this.dialogRef.close(saved);
      },
      error: (error: unknown) => {
        this.busy.set(false);
        for (const field of problemFieldErrors(error)) {
          const control = this.form.get(field.field.replace(/^capabilities\./, ''));
          control?.setErrors({ server: field.message });
          control?.markAsTouched();
        }
        this.error.set(problemMessage(error, 'The tunnel could not be saved.'));
      },
    });
  }
}
