import type { Chart, ChartDataset, Plugin } from 'chart.js';

/** What the plugin reads from a data point: its bar ends, when it has a bar. */
interface BarEnds {
  readonly yMin?: number | null;
  readonly yMax?: number | null;
}

/** Half width of the bar caps, px. */
const CAP = 3;

function barEnds(value: unknown): { yMin: number; yMax: number } | null {
  if (value === null || typeof value !== 'object') return null;
  const { yMin, yMax } = value as BarEnds;
  return typeof yMin === 'number' && typeof yMax === 'number' && Number.isFinite(yMin) && Number.isFinite(yMax) ? { yMin, yMax } : null;
}

/**
 * Lowest and highest bar end over the visible datasets, so the y axis can be widened to show whole bars;
 * null when no dataset has a bar.
 */
export function errorBarRange(datasets: readonly Pick<ChartDataset<'line'>, 'data' | 'hidden'>[]): { min: number; max: number } | null {
  let min = Infinity;
  let max = -Infinity;
  for (const dataset of datasets) {
    if (dataset.hidden) continue;
    for (const value of dataset.data) {
      const ends = barEnds(value);
      if (!ends) continue;
      min = Math.min(min, ends.yMin);
      max = Math.max(max, ends.yMax);
    }
  }
  return min <= max ? { min, max } : null;
}

/**
 * Draws a vertical error bar with caps at every data point that carries `yMin` and `yMax` (y ± U), in its dataset's
 * colour, and widens the y axis to hold the bars.
 */
export const errorBarPlugin: Plugin<'line'> = {
  id: 'twErrorBars',
  afterDataLimits(chart: Chart<'line'>, args) {
    if (args.scale.id !== 'y') return;
    const visible = chart.data.datasets.filter((_, i) => chart.isDatasetVisible(i));
    const range = errorBarRange(visible);
    if (!range) return;
    args.scale.min = Math.min(args.scale.min, range.min);
    args.scale.max = Math.max(args.scale.max, range.max);
  },
  afterDatasetsDraw(chart: Chart<'line'>) {
    const y = chart.scales['y'];
    if (!y) return;
    const { ctx } = chart;
    chart.data.datasets.forEach((dataset, i) => {
      if (!chart.isDatasetVisible(i)) return;
      const meta = chart.getDatasetMeta(i);
      ctx.save();
      ctx.strokeStyle = typeof dataset.borderColor === 'string' ? dataset.borderColor : '#555';
      ctx.lineWidth = 1;
      meta.data.forEach((element, j) => {
        const ends = barEnds(dataset.data[j]);
        if (!ends) return;
        const top = y.getPixelForValue(ends.yMax);
        const bottom = y.getPixelForValue(ends.yMin);
        ctx.beginPath();
        ctx.moveTo(element.x, top);
        ctx.lineTo(element.x, bottom);
        ctx.moveTo(element.x - CAP, top);
        ctx.lineTo(element.x + CAP, top);
        ctx.moveTo(element.x - CAP, bottom);
        ctx.lineTo(element.x + CAP, bottom);
        ctx.stroke();
      });
      ctx.restore();
    });
  },
};
