import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { BarController, BarElement, CategoryScale, LinearScale, Tooltip, type ChartConfiguration } from 'chart.js';
import { BaseChartDirective, provideCharts } from 'ng2-charts';
import type { PlanPartResult } from '@tunnelwright/contracts';

/** Horizontal bars of each part's C_D·A, the contributions to the build-up. */
@Component({
  selector: 'tw-drag-share-chart',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [BaseChartDirective],
  providers: [provideCharts({ registerables: [BarController, BarElement, CategoryScale, LinearScale, Tooltip] })],
  template: `
    <div class="chart">
      <canvas baseChart type="bar" [data]="data()" [options]="options" [attr.aria-label]="summary()" role="img"></canvas>
    </div>
  `,
  styles: `
    .chart {
      position: relative;
      height: 220px;
    }
  `,
})
export class DragShareChart {
  readonly parts = input.required<readonly PlanPartResult[]>();

  protected readonly data = computed<ChartConfiguration<'bar'>['data']>(() => ({
    labels: this.parts().map((part) => part.label),
    datasets: [{ label: 'C_D·A (m²)', data: this.parts().map((part) => part.dragArea), backgroundColor: '#3f6fb5' }],
  }));

  protected readonly summary = computed(
    () => `Drag area by part: ${this.parts().map((part) => `${part.label} ${(part.dragShare * 100).toFixed(0)} %`).join(', ')}`,
  );

  protected readonly options: ChartConfiguration<'bar'>['options'] = {
    indexAxis: 'y',
    responsive: true,
    maintainAspectRatio: false,
    animation: false,
    scales: { x: { title: { display: true, text: 'C_D·A (m²)' }, beginAtZero: true } },
  };
}
