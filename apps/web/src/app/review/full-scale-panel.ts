import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, linkedSignal, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import type { FullScaleInput, ReviewRun } from '@tunnelwright/contracts';
import { of } from 'rxjs';
import { problemFieldErrors, problemMessage } from '../core/problem-message';
import { ErrorBanner } from '../shared/error-banner';
import { runLabel } from './chart-series';
import { keptChoice } from './kept-choice';
import { ReviewApi } from './review-api';
import { ReviewChart, type ChartLine } from './review-chart';
import { airText, dragText, powerText, reynoldsText, windDirectionText } from './summary-format';

/** Road speed and wind the estimate starts from: 25 m/s (90 km/h) into a 3 m/s head wind. */
export const DEFAULT_ROAD_CONDITION: FullScaleInput = { groundSpeed: 25, windSpeed: 3, windDirection: 0 };

/**
 * Summary of one run's shown version at full scale: wind-averaged C_D, drag and power at the ground speed and wind
 * the analyst enters (head, tail or any direction) in ISA sea-level air or at an entered temperature and pressure, power against wind direction, and the model-to-full-scale
 * Reynolds-number ratio with what it means. Always shown with the design caution.
 */
@Component({
  selector: 'tw-full-scale-panel',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DecimalPipe, ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatInputModule, MatProgressBarModule, MatSelectModule, ErrorBanner, ReviewChart],
  templateUrl: './full-scale-panel.html',
  styleUrl: './full-scale-panel.scss',
})
export class FullScalePanel {
  /** Runs with a shown version; the estimate uses one of them. */
  readonly runs = input.required<readonly ReviewRun[]>();

  private readonly api = inject(ReviewApi);

  protected readonly runId = linkedSignal<readonly ReviewRun[], string | null>({
    source: this.runs,
    computation: (runs, previous) => keptChoice(runs, previous, () => runs.find((r) => r.kind === 'data')?.id ?? runs[0]?.id ?? null),
  });
  private readonly run = computed(() => this.runs().find((r) => r.id === this.runId()) ?? null);
  /** The shown version and its exclusions: a change to either asks again. */
  private readonly basis = computed(() => {
    const selected = this.run()?.selected;
    if (!selected) return null;
    return `${selected.reductionId}|${selected.points.filter((p) => p.exclusion !== null).map((p) => p.index).join(',')}`;
  });
  protected readonly form = new FormGroup({
    groundSpeed: new FormControl<number | null>(DEFAULT_ROAD_CONDITION.groundSpeed, [Validators.required, Validators.min(0.1), Validators.max(150)]),
    windSpeed: new FormControl<number | null>(DEFAULT_ROAD_CONDITION.windSpeed, [Validators.required, Validators.min(0), Validators.max(60)]),
    windDirection: new FormControl<number | null>(DEFAULT_ROAD_CONDITION.windDirection, [Validators.required, Validators.min(0), Validators.max(360)]),
    /** Blank with the pressure: ISA sea-level air. */
    airTemperature: new FormControl<number | null>(null, [Validators.min(-40), Validators.max(55)]),
    airPressure: new FormControl<number | null>(null, [Validators.min(700), Validators.max(1100)]),
  });
  private readonly submitted = signal<FullScaleInput>(DEFAULT_ROAD_CONDITION);

  protected readonly estimate = rxResource({
    params: () => {
      const basis = this.basis();
      return basis ? { reductionId: basis.split('|')[0], input: this.submitted(), basis } : undefined;
    },
    stream: ({ params }) => (params ? this.api.fullScale(params.reductionId, params.input) : of(undefined)),
  });
  protected readonly errorText = computed(() => {
    const error = this.estimate.error();
    return error ? problemMessage(error, 'The full-scale estimate could not be made.') : null;
  });
  protected readonly powerLines = computed<ChartLine[]>(() => {
    const value = this.estimate.value();
    if (!value) return [];
    const points = value.powerByDirection.flatMap((p) => (p.power === null ? [] : [{ x: p.windDirection, y: p.power }]));
    return [{ label: `Power at ${value.input.groundSpeed} m/s in a ${Number(value.input.windSpeed.toFixed(2))} m/s wind`, points, kind: 'measured' }];
  });
  /** Whether the measured yaw range left gaps in the power-against-direction chart. */
  protected readonly seriesHasGaps = computed(() => this.estimate.value()?.powerByDirection.some((p) => p.power === null) ?? false);

  constructor() {
    // A field the server refused is marked on the form, with the server's words.
    effect(() => {
      const error = this.estimate.error();
      for (const field of error ? problemFieldErrors(error) : []) {
        const control = this.form.get(field.field);
        control?.setErrors({ server: field.message });
        control?.markAsTouched();
      }
    });
  }

  protected readonly label = runLabel;
  protected readonly power = powerText;
  protected readonly drag = dragText;
  protected readonly reynolds = reynoldsText;
  protected readonly direction = windDirectionText;
  protected readonly air = airText;

  /** Sets the wind direction from a preset button and estimates again. */
  protected preset(windDirection: number): void {
    this.form.controls.windDirection.setValue(windDirection);
    this.submit();
  }

  protected submit(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const { groundSpeed, windSpeed, windDirection, airTemperature, airPressure } = this.form.getRawValue();
    this.submitted.set({
      groundSpeed: Number(groundSpeed),
      windSpeed: Number(windSpeed),
      windDirection: Number(windDirection),
      ...(airTemperature === null ? {} : { airTemperature: Number(airTemperature) }),
      ...(airPressure === null ? {} : { airPressure: Number(airPressure) }),
    });
  }
}
