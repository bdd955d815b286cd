import { ChangeDetectionStrategy, Component, inject, input, output, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type { ReductionOverrides, ReductionView, ReferenceAreaKind } from '@tunnelwright/contracts';
import { problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { IngestApi } from './ingest-api';

type WakeMethod = NonNullable<NonNullable<ReductionOverrides['corrections']>['wakeBlockage']>;
type SolidMethod = NonNullable<NonNullable<ReductionOverrides['corrections']>['solidBlockage']>;
type DensityModel = NonNullable<ReductionOverrides['densityModel']>;

/** Choices of the form; an empty value keeps the test's own setting. */
const wakeMethods: readonly { value: WakeMethod | ''; label: string }[] = [
  { value: '', label: 'As the test says' },
  { value: 'maskell', label: 'Maskell (separated wake)' },
  { value: 'streamlined', label: 'Streamlined body' },
  { value: 'none', label: 'None' },
];
const solidMethods: readonly { value: SolidMethod | ''; label: string }[] = [
  { value: '', label: 'As the test says' },
  { value: 'thom', label: 'Thom (volume)' },
  { value: 'frontal-area', label: 'Frontal-area ratio' },
  { value: 'none', label: 'None' },
];
const densityModels: readonly { value: DensityModel | ''; label: string }[] = [
  { value: '', label: 'As the test says' },
  { value: 'cipm-2007', label: 'CIPM-2007 moist air' },
  { value: 'ideal-gas-buck', label: 'Ideal gas with Buck vapour pressure' },
];

/** An analyst's request to reduce the run again with other corrections, reference area or density model. */
@Component({
  selector: 'tw-re-reduce-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatInputModule, MatSelectModule, ErrorBanner],
  template: `
    <form [formGroup]="form" (ngSubmit)="submit()" aria-label="Reduce again">
      <mat-form-field>
        <mat-label>Wake blockage</mat-label>
        <mat-select formControlName="wakeBlockage">
          @for (choice of wakeMethods; track choice.value) {
            <mat-option [value]="choice.value">{{ choice.label }}</mat-option>
          }
        </mat-select>
      </mat-form-field>
      @if (form.controls.wakeBlockage.value === 'maskell') {
        <mat-form-field>
          <mat-label>Maskell θ</mat-label>
          <input matInput type="number" step="any" formControlName="maskellTheta" />
          <mat-hint>Leave empty for the engine's default</mat-hint>
          @if (form.controls.maskellTheta.hasError('min')) {
            <mat-error>θ must be greater than zero</mat-error>
          }
        </mat-form-field>
      }
      <mat-form-field>
        <mat-label>Solid blockage</mat-label>
        <mat-select formControlName="solidBlockage">
          @for (choice of solidMethods; track choice.value) {
            <mat-option [value]="choice.value">{{ choice.label }}</mat-option>
          }
        </mat-select>
      </mat-form-field>
      <mat-form-field>
        <mat-label>Density model</mat-label>
        <mat-select formControlName="densityModel">
          @for (choice of densityModels; track choice.value) {
            <mat-option [value]="choice.value">{{ choice.label }}</mat-option>
          }
        </mat-select>
      </mat-form-field>
      <mat-form-field>
        <mat-label>Reference area (m²)</mat-label>
        <input matInput type="number" step="any" formControlName="referenceArea" />
        <mat-hint>Leave empty to keep the article's</mat-hint>
        @if (form.controls.referenceArea.hasError('min')) {
          <mat-error>The reference area must be greater than zero</mat-error>
        }
      </mat-form-field>
      <mat-form-field>
        <mat-label>Reference area is</mat-label>
        <mat-select formControlName="referenceAreaKind">
          <mat-option value="">As the article says</mat-option>
          <mat-option value="frontal">Frontal</mat-option>
          <mat-option value="planform">Planform</mat-option>
          <mat-option value="wetted">Wetted</mat-option>
          <mat-option value="other">Other</mat-option>
        </mat-select>
      </mat-form-field>
      @if (error()) {
        <tw-error-banner [message]="error()" [retryable]="false" />
      }
      <div class="actions">
        <button mat-flat-button type="submit" [disabled]="saving()">Reduce again as a new version</button>
      </div>
    </form>
  `,
  styles: `
    form {
      display: flex;
      flex-wrap: wrap;
      gap: 0 16px;
    }
    .actions,
    tw-error-banner {
      flex: 1 1 100%;
    }
  `,
})
export class ReReduceForm {
  readonly runId = input.required<string>();
  /** Emitted with the new, queued version. */
  readonly created = output<ReductionView>();

  private readonly api = inject(IngestApi);
  protected readonly wakeMethods = wakeMethods;
  protected readonly solidMethods = solidMethods;
  protected readonly densityModels = densityModels;
  protected readonly saving = signal(false);
  protected readonly error = signal('');
  protected readonly form = new FormGroup({
    wakeBlockage: new FormControl<WakeMethod | ''>('', { nonNullable: true }),
    // The smallest number above zero: the API wants θ and the area strictly positive.
    maskellTheta: new FormControl<number | null>(null, [Validators.min(Number.MIN_VALUE)]),
    solidBlockage: new FormControl<SolidMethod | ''>('', { nonNullable: true }),
    densityModel: new FormControl<DensityModel | ''>('', { nonNullable: true }),
    referenceArea: new FormControl<number | null>(null, [Validators.min(Number.MIN_VALUE)]),
    referenceAreaKind: new FormControl<ReferenceAreaKind | ''>('', { nonNullable: true }),
  });

  protected submit(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.saving.set(true);
    this.error.set('');
    this.api.reduceAgain(this.runId(), this.overrides()).subscribe({
      next: (reduction) => {
        this.saving.set(false);
        this.created.emit(reduction);
      },
      error: (error: unknown) => {
        this.saving.set(false);
        this.error.set(problemMessage(error, 'The run could not be reduced again.'));
      },
    });
  }

  /** Only what the analyst changed; the rest comes from the test. */
  private overrides(): ReductionOverrides {
    const v = this.form.getRawValue();
    const corrections: NonNullable<ReductionOverrides['corrections']> = {};
    if (v.wakeBlockage) corrections.wakeBlockage = v.wakeBlockage;
    if (v.wakeBlockage === 'maskell' && v.maskellTheta !== null) corrections.maskellTheta = v.maskellTheta;
    if (v.solidBlockage) corrections.solidBlockage = v.solidBlockage;
    return {
      ...(Object.keys(corrections).length > 0 ? { corrections } : {}),
      ...(v.densityModel ? { densityModel: v.densityModel } : {}),
      ...(v.referenceArea !== null ? { referenceArea: v.referenceArea } : {}),
      ...(v.referenceAreaKind ? { referenceAreaKind: v.referenceAreaKind } : {}),
    };
  }
}
