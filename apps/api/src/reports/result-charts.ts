import { createCanvas } from '@napi-rs/canvas';
import {
  Chart,
  Colors,
  Legend,
  LinearScale,
  LineController,
  LineElement,
  PointElement,
  ScatterController,
  Title,
  type ChartConfiguration,
  type ChartItem,
  type Plugin,
  type PointStyle,
} from 'chart.js';
import { encodeOpaquePng } from './opaque-png';
import { CHART_FONT_FAMILY, registerChartFont } from './report-fonts';
import type { MeasuredValue, ResultConfiguration, ResultPoint, ResultSheetData } from './result-sheet-data';

Chart.register(ScatterController, LineController, LineElement, PointElement, LinearScale, Legend, Title, Colors);

/** Size of one chart on the page, pt (1/72 in), and the print resolution it is drawn at. */
export const CHART_WIDTH_PT = 515;
export const CHART_HEIGHT_PT = 270;
export const CHART_DPI = 200;

/** The four charts of a sheet as PNG bytes. */
export interface ResultCharts {
  dragVersusYaw: Buffer;
  liftVersusYaw: Buffer;
  sideForceVersusYaw: Buffer;
  dragVersusReynolds: Buffer;
}

interface Series {
  label: string;
  points: { x: number; y: MeasuredValue }[];
}

const POINT_STYLES: PointStyle[] = ['circle', 'rect', 'triangle', 'rectRot', 'crossRot', 'star'];

/** Error bars of ±U (k = 2) drawn after each dataset, in the dataset's own colour. */
const errorBars: Plugin<'scatter'> = {
  id: 'twErrorBars',
  afterDatasetsDraw(chart) {
    const { ctx } = chart;
    const y = chart.scales['y'];
    const uncertainties = (chart.options.plugins as { twErrorBars?: { u: number[][] } }).twErrorBars?.u ?? [];
    chart.data.datasets.forEach((dataset, d) => {
      const meta = chart.getDatasetMeta(d);
      ctx.save();
      ctx.beginPath();
      ctx.rect(chart.chartArea.left, chart.chartArea.top, chart.chartArea.width, chart.chartArea.height);
      ctx.clip();
      ctx.strokeStyle = String(dataset.borderColor ?? '#333');
      ctx.lineWidth = 1;
      meta.data.forEach((element, i) => {
        const u = uncertainties[d]?.[i];
        const value = (dataset.data[i] as { y: number }).y;
        if (u === undefined) return;
        const top = y.getPixelForValue(value + u);
        const bottom = y.getPixelForValue(value - u);
        ctx.beginPath();
        ctx.moveTo(element.x, top);
        ctx.lineTo(element.x, bottom);
        ctx.moveTo(element.x - 4, top);
        ctx.lineTo(element.x + 4, top);
        ctx.moveTo(element.x - 4, bottom);
        ctx.lineTo(element.x + 4, bottom);
        ctx.stroke();
      });
      ctx.restore();
    });
  },
};

const white: Plugin<'scatter'> = {
  id: 'twWhiteBackground',
  beforeDraw(chart) {
    chart.ctx.save();
    chart.ctx.fillStyle = '#ffffff';
    chart.ctx.fillRect(0, 0, chart.width, chart.height);
    chart.ctx.restore();
  },
};

/** Tick label with a true minus sign, as in the tables. */
function tickLabel(value: string | number): string {
  return Number(value)
    .toLocaleString('en-GB', { maximumFractionDigits: 4, useGrouping: false })
    .replace('-', '−');
}

/** A y range that holds every error bar, with a margin. */
function valueRange(series: Series[]): { suggestedMin: number; suggestedMax: number } {
  const ends = series.flatMap((s) => s.points.flatMap((p) => [p.y.value - p.y.expandedUncertainty, p.y.value + p.y.expandedUncertainty]));
  const low = Math.min(...ends);
  const high = Math.max(...ends);
  const margin = (high - low) * 0.06 || Math.abs(high) * 0.05 || 0.01;
  return { suggestedMin: low - margin, suggestedMax: high + margin };
}

/** Yaw axis ticked every 2 degrees, from the even degree at least one beyond the outermost points. */
function yawAxis(series: Series[]): { min: number; max: number; ticks: { stepSize: number } } {
  const xs = series.flatMap((s) => s.points.map((p) => p.x));
  return { min: Math.floor((Math.min(...xs) - 1) / 2) * 2, max: Math.ceil((Math.max(...xs) + 1) / 2) * 2, ticks: { stepSize: 2 } };
}

function drawChart(title: string, xTitle: string, yTitle: string, series: Series[], xTick?: (v: number) => string): Buffer {
  const xAxis = xTick ? { ticks: { callback: (v: string | number) => xTick(Number(v)) } } : { ...yawAxis(series), ticks: { stepSize: 2, callback: tickLabel } };
  registerChartFont();
  Chart.defaults.font.family = CHART_FONT_FAMILY;
  Chart.defaults.font.size = 8;
  Chart.defaults.color = '#222';
  const scale = CHART_DPI / 72;
  // chart.js sizes in CSS pixels (one per pt here) and multiplies the backing store by devicePixelRatio.
  const canvas = createCanvas(CHART_WIDTH_PT, CHART_HEIGHT_PT);
  const config: ChartConfiguration<'scatter'> = {
    type: 'scatter',
    data: {
      datasets: series.map((s, i) => ({
        label: s.label,
        data: s.points.map((p) => ({ x: p.x, y: p.y.value })),
        showLine: true,
        borderWidth: 1.25,
        pointRadius: 3,
        pointStyle: POINT_STYLES[i % POINT_STYLES.length],
      })),
    },
    options: {
      responsive: false,
      animation: false,
      devicePixelRatio: scale,
      layout: { padding: 4 },
      scales: {
        x: { type: 'linear', title: { display: true, text: xTitle }, grid: { color: '#e3e3e3' }, ...xAxis },
        y: { type: 'linear', title: { display: true, text: yTitle }, grid: { color: '#e3e3e3' }, ...valueRange(series), ticks: { callback: tickLabel } },
      },
      plugins: {
        title: { display: true, text: title, font: { size: 9, weight: 'bold' }, align: 'start' },
        legend: { position: 'bottom', labels: { usePointStyle: true, boxWidth: 6, boxHeight: 6 } },
        colors: { forceOverride: true },
        ...({ twErrorBars: { u: series.map((s) => s.points.map((p) => p.y.expandedUncertainty)) } } as object),
      },
    },
    plugins: [white, errorBars],
  };
  // chart.js needs only getContext('2d') and width/height, which @napi-rs/canvas provides.
  const chart = new Chart(canvas as unknown as ChartItem, config);
  const pixels = canvas.getContext('2d').getImageData(0, 0, canvas.width, canvas.height);
  const png = encodeOpaquePng(pixels.data, canvas.width, canvas.height);
  chart.destroy();
  return png;
}

function seriesOf(configurations: ResultConfiguration[], x: (p: ResultPoint) => number, y: (p: ResultPoint) => MeasuredValue): Series[] {
  return configurations.map((c) => ({
    label: `${c.code}: ${c.label}`,
    points: c.points.map((p) => ({ x: x(p), y: y(p) })).sort((a, b) => a.x - b.x),
  }));
}

/**
 * Draws C_D, C_L and C_Y against yaw (yaw sweeps) and C_D against Reynolds number (speed sweeps), each point with
 * its ±U (k = 2) error bar, at print resolution.
 */
export function renderResultCharts(data: ResultSheetData): ResultCharts {
  const yawSweeps = data.configurations.filter((c) => c.sweep === 'yaw');
  const speedSweeps = data.configurations.filter((c) => c.sweep === 'reynolds');
  const yaw = (p: ResultPoint) => p.yaw;
  const note = 'error bars: U (k = 2)';
  return {
    dragVersusYaw: drawChart(`Drag coefficient C_D against yaw (${note})`, 'Yaw angle [deg]', 'C_D [-]', seriesOf(yawSweeps, yaw, (p) => p.dragCoefficient)),
    liftVersusYaw: drawChart(`Lift coefficient C_L against yaw (${note})`, 'Yaw angle [deg]', 'C_L [-]', seriesOf(yawSweeps, yaw, (p) => p.liftCoefficient)),
    sideForceVersusYaw: drawChart(`Side-force coefficient C_Y against yaw (${note})`, 'Yaw angle [deg]', 'C_Y [-]', seriesOf(yawSweeps, yaw, (p) => p.sideForceCoefficient)),
    dragVersusReynolds: drawChart(
      `Drag coefficient C_D against Reynolds number (${note})`,
      'Reynolds number on the reference length [×10^6]',
      'C_D [-]',
      seriesOf(speedSweeps, (p) => p.conditions.reynoldsNumber, (p) => p.dragCoefficient),
      (v) => (v / 1e6).toFixed(2),
    ),
  };
}
