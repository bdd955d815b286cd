import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { ReviewRun } from '@tunnelwright/contracts';
import { coefficientSeries, runLabel } from './chart-series';
import { ReviewChart, type ChartLine } from './review-chart';
import { reynoldsText } from './summary-format';

/** A sphere calibration run's C_D against Re beside the published smooth-sphere curves, with Re_crit and the turbulence factor. */
@Component({
  selector: 'tw-sphere-calibration-panel',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReviewChart],
  template: `
    <tw-review-chart [lines]="lines()" [caption]="caption()" xTitle="Reynolds number" yTitle="C_D" [xLog]="true" />
    @if (sphere(); as s) {
      <dl class="figures">
        <dt>Critical Reynolds number (C_D = 0.3)</dt>
        <dd>{{ reynolds(s.criticalReynoldsNumber) }}</dd>
        <dt>Turbulence factor TF = 385 000 / Re_crit</dt>
        <dd>{{ s.turbulenceFactor === null ? '—' : s.turbulenceFactor.toFixed(3) }}</dd>
      </dl>
      @if (s.reason) {
        <p role="note">{{ s.reason }}</p>
      }
      <p class="source">{{ s.source }}.</p>
      <ul class="source">
        @for (curve of s.referenceCurves; track curve.id) {
          <li>{{ curve.label }}: {{ curve.source }}</li>
        }
      </ul>
    }
  `,
  styles: `
    .figures {
      display: grid;
      grid-template-columns: max-content auto;
      gap: 4px 16px;
    }
    dd {
      margin: 0;
      font-weight: 500;
    }
    .source {
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
})
export class SphereCalibrationPanel {
  readonly run = input.required<ReviewRun>();

  protected readonly sphere = computed(() => this.run().selected?.sphere ?? null);
  protected readonly caption = computed(() => `${runLabel(this.run())}: sphere C_D against Reynolds number`);
  protected readonly lines = computed<ChartLine[]>(() => [
    { label: `${runLabel(this.run())} measured`, points: coefficientSeries(this.run().selected?.points ?? [], 'dragCoefficient', 'reynoldsNumber'), kind: 'measured' },
    ...(this.sphere()?.referenceCurves ?? []).map((curve) => ({
      label: curve.label,
      points: curve.points.map((p) => ({ x: p.reynoldsNumber, y: p.dragCoefficient })),
      kind: 'reference' as const,
    })),
  ]);
  protected readonly reynolds = reynoldsText;
}
