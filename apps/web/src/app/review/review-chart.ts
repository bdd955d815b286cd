import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { Legend, LineController, LineElement, LinearScale, LogarithmicScale, PointElement, Tooltip, type ChartConfiguration } from 'chart.js';
import { BaseChartDirective, provideCharts } from 'ng2-charts';
import type { ErrorBarPoint } from './chart-series';
import { errorBarPlugin } from './error-bar-plugin';

/** One line of a review chart: measured points (with optional error bars) or a published reference curve. */
export interface ChartLine {
  readonly label: string;
  readonly points: readonly (ErrorBarPoint | { readonly x: number; readonly y: number })[];
  readonly kind: 'measured' | 'reference';
}

/** Colours told apart by most readers, in legend order (measured lines). */
const palette = ['#1f5fa8', '#c2571a', '#2a8a4a', '#8e3ea8', '#a8862a', '#2a8a8a', '#a82a4f', '#5a5a5a'];
const referencePalette = ['#6d6d6d', '#9a7b4f', '#4f7b9a', '#7b4f9a'];

/** A line chart of measured series and reference curves, with y ± U error bars and a legend. */
@Component({
  selector: 'tw-review-chart',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [BaseChartDirective],
  providers: [provideCharts({ registerables: [LineController, LineElement, PointElement, LinearScale, LogarithmicScale, Tooltip, Legend] })],
  template: `
    <figure>
      <figcaption>{{ caption() }}</figcaption>
      <div class="chart">
        <canvas baseChart type="line" [data]="data()" [options]="options()" [plugins]="plugins" role="img" [attr.aria-label]="summary()"></canvas>
      </div>
    </figure>
  `,
  styles: `
    figure {
      margin: 0;
    }
    figcaption {
      font: var(--mat-sys-title-small);
      margin-bottom: 4px;
    }
    .chart {
      position: relative;
      height: 300px;
    }
  `,
})
export class ReviewChart {
  readonly lines = input.required<readonly ChartLine[]>();
  readonly caption = input.required<string>();
  readonly xTitle = input.required<string>();
  readonly yTitle = input.required<string>();
  /**
   * Whether x is a Reynolds number: tick labels in powers of ten, and a logarithmic axis once the data span more
   * than a decade (a narrow span reads better on a linear axis).
   */
  readonly xLog = input(false);
  /** Whether measured points are joined in x order; off for plots where x order means nothing (C_D against Re). */
  readonly joined = input(true);

  protected readonly plugins = [errorBarPlugin];

  protected readonly data = computed<ChartConfiguration<'line'>['data']>(() => {
    let measured = 0;
    let reference = 0;
    return {
      datasets: this.lines().map((line) => {
        const colour = line.kind === 'measured' ? palette[measured++ % palette.length] : referencePalette[reference++ % referencePalette.length];
        return {
          label: line.label,
          data: line.points.map((p) => ({ ...p })),
          borderColor: colour,
          backgroundColor: colour,
          borderWidth: line.kind === 'measured' ? 2 : 1.5,
          borderDash: line.kind === 'reference' ? [6, 4] : [],
          pointRadius: line.kind === 'measured' ? (line.points.length > 40 ? 1.5 : 3) : 0,
          showLine: line.kind === 'reference' || this.joined(),
        };
      }),
    };
  });

  protected readonly options = computed<ChartConfiguration<'line'>['options']>(() => {
    const xs = this.lines().flatMap((line) => line.points.map((p) => p.x)).filter((x) => x > 0);
    const [low, high] = xs.length > 0 ? [Math.min(...xs), Math.max(...xs)] : [1, 1];
    const logarithmic = this.xLog() && high / low > 10;
    // Enough significant figures that ticks over a narrow span still differ.
    const digits = high > low ? Math.min(6, Math.max(2, Math.ceil(Math.log10(high / (high - low))) + 1)) : 2;
    return {
      responsive: true,
      maintainAspectRatio: false,
      animation: false,
      parsing: { xAxisKey: 'x', yAxisKey: 'y' },
      plugins: { legend: { display: true, position: 'bottom' } },
      scales: {
        x: {
          type: logarithmic ? 'logarithmic' : 'linear',
          title: { display: true, text: this.xTitle() },
          ticks: this.xLog() ? { maxTicksLimit: 6, callback: (value) => Number(value).toExponential(digits) } : {},
        },
        y: { type: 'linear', title: { display: true, text: this.yTitle() } },
      },
    };
  });

  /** A sentence for screen readers: what is plotted and over what range. */
  protected readonly summary = computed(() => {
    const measured = this.lines().filter((l) => l.kind === 'measured' && l.points.length > 0);
    if (measured.length === 0) return `${this.caption()}: nothing to plot`;
    const xs = measured.flatMap((l) => l.points.map((p) => p.x));
    return `${this.caption()}: ${measured.map((l) => `${l.label}, ${l.points.length} points`).join('; ')}; ${this.xTitle()} from ${Math.min(...xs).toPrecision(3)} to ${Math.max(...xs).toPrecision(3)}`;
  });
}
