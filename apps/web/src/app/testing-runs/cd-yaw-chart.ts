import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { LineController, LineElement, LinearScale, PointElement, Tooltip, type ChartConfiguration } from 'chart.js';
import { BaseChartDirective, provideCharts } from 'ng2-charts';
import type { ReducedPoint } from './ingest-api';

/** Corrected C_D against yaw for one reduction, points joined in yaw order. */
@Component({
  selector: 'tw-cd-yaw-chart',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [BaseChartDirective],
  providers: [provideCharts({ registerables: [LineController, LineElement, PointElement, LinearScale, Tooltip] })],
  template: `
    <div class="chart" [class.compact]="compact()">
      <canvas baseChart type="line" [data]="data()" [options]="options" role="img" [attr.aria-label]="summary()"></canvas>
    </div>
  `,
  styles: `
    .chart {
      position: relative;
      height: 260px;
    }
    .chart.compact {
      height: 120px;
      width: 240px;
    }
  `,
})
export class CdYawChart {
  readonly points = input.required<readonly ReducedPoint[]>();
  /** Whether to draw the small version used inside a table row. */
  readonly compact = input(false);

  private readonly pairs = computed(() =>
    this.points()
      .filter((point) => point.cdCorrected !== null)
      .map((point) => ({ x: point.yaw, y: point.cdCorrected as number }))
      .sort((a, b) => a.x - b.x),
  );

  protected readonly data = computed<ChartConfiguration<'line'>['data']>(() => ({
    datasets: [{ label: 'C_D corrected', data: this.pairs(), borderColor: '#3f6fb5', backgroundColor: '#3f6fb5', pointRadius: 2 }],
  }));

  protected readonly summary = computed(() => {
    const pairs = this.pairs();
    if (pairs.length === 0) return 'No corrected drag coefficients to plot';
    const values = pairs.map((pair) => pair.y);
    return `Corrected C_D against yaw, ${pairs.length} points from ${pairs[0].x}° to ${pairs[pairs.length - 1].x}°, C_D ${Math.min(...values).toFixed(3)} to ${Math.max(...values).toFixed(3)}`;
  });

  protected readonly options: ChartConfiguration<'line'>['options'] = {
    responsive: true,
    maintainAspectRatio: false,
    animation: false,
    scales: {
      x: { type: 'linear', title: { display: true, text: 'Yaw (°)' } },
      y: { title: { display: true, text: 'C_D corrected' } },
    },
  };
}
