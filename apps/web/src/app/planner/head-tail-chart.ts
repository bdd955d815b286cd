import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { CategoryScale, Legend, LinearScale, LineController, LineElement, PointElement, Tooltip, type ChartConfiguration } from 'chart.js';
import { BaseChartDirective, provideCharts } from 'ng2-charts';
import type { PlanEvaluation } from '@tunnelwright/contracts';

/** Full-scale power against wind speed, dead ahead and dead astern. */
@Component({
  selector: 'tw-head-tail-chart',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [BaseChartDirective],
  providers: [provideCharts({ registerables: [LineController, LineElement, PointElement, CategoryScale, LinearScale, Legend, Tooltip] })],
  template: `
    <div class="chart">
      <canvas baseChart type="line" [data]="data()" [options]="options" role="img" aria-label="Power against wind speed, headwind and tailwind"></canvas>
    </div>
  `,
  styles: `
    .chart {
      position: relative;
      height: 240px;
    }
  `,
})
export class HeadTailChart {
  readonly series = input.required<PlanEvaluation['powerSeries']>();

  protected readonly data = computed<ChartConfiguration<'line'>['data']>(() => ({
    labels: this.series().map((point) => point.windSpeed.toFixed(1)),
    datasets: [
      { label: 'Headwind power (W)', data: this.series().map((point) => point.headwind.power), borderColor: '#b5473f', backgroundColor: '#b5473f' },
      // A tailwind at or above the ground speed has no constant-C_D·A answer: the line stops there.
      { label: 'Tailwind power (W)', data: this.series().map((point) => point.tailwind?.power ?? null), borderColor: '#3f6fb5', backgroundColor: '#3f6fb5' },
    ],
  }));

  protected readonly options: ChartConfiguration<'line'>['options'] = {
    responsive: true,
    maintainAspectRatio: false,
    animation: false,
    scales: {
      x: { title: { display: true, text: 'Wind speed (m/s)' } },
      y: { title: { display: true, text: 'Power (W)' }, beginAtZero: true },
    },
  };
}
