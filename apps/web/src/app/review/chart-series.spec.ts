import { coefficientSeries, runLabel, runSeries } from './chart-series';
import { errorBarRange } from './error-bar-plugin';
import { reviewPoint, reviewRun, sampleExclusion } from './review-test-data';

const excluded = sampleExclusion;

describe('coefficientSeries', () => {
  it('gives y ± U as the bar ends and sorts by x', () => {
    const series = coefficientSeries([reviewPoint(0, 4, 0.32, 0.004), reviewPoint(1, -2, 0.3, 0.002)], 'dragCoefficient', 'yaw');
    expect(series.map((p) => p.x)).toEqual([-2, 4]);
    expect(series[0].y).toBe(0.3);
    expect(series[0].yMin).toBeCloseTo(0.298, 15);
    expect(series[0].yMax).toBeCloseTo(0.302, 15);
    expect(series[1].yMin).toBeCloseTo(0.316, 15);
    expect(series[1].yMax).toBeCloseTo(0.324, 15);
  });

  it('draws no bar without U, and leaves out excluded points and missing values', () => {
    const points = [reviewPoint(0, 0, 0.3, null), reviewPoint(1, 2, 0.31, 0.01, { exclusion: excluded }), reviewPoint(2, 4, 0.33, 0.01, { speed: null })];
    const series = coefficientSeries(points, 'dragCoefficient', 'yaw');
    expect(series.map((p) => [p.x, p.y])).toEqual([
      [0, 0.3],
      [4, 0.33],
    ]);
    expect([series[0].yMin, series[0].yMax]).toEqual([null, null]);
    expect(series[1].yMin).toBeCloseTo(0.32, 15);
    expect(series[1].yMax).toBeCloseTo(0.34, 15);
    expect(coefficientSeries(points, 'dragCoefficient', 'speed').map((p) => p.x)).toEqual([30]);
    expect(coefficientSeries(points, 'sideForceCoefficient', 'yaw')).toEqual([]);
  });

  it('labels runs by number, configuration and version, and skips runs with nothing shown', () => {
    const shown = reviewRun(2, [reviewPoint(0, 0, 0.3, 0.01)], 'mirrors off');
    const unreduced = { ...reviewRun(3, []), selected: null };
    expect(runLabel(shown)).toBe('Run 2 mirrors off v1');
    expect(runSeries([shown, unreduced], 'dragCoefficient', 'reynoldsNumber').map((s) => [s.label, s.points.length])).toEqual([['Run 2 mirrors off v1', 1]]);
  });
});

describe('errorBarRange', () => {
  it('spans the lowest and highest bar end of the visible datasets', () => {
    const datasets = [
      { data: [{ x: 0, y: 0.3, yMin: 0.29, yMax: 0.31 }, { x: 1, y: 0.5, yMin: null, yMax: null }] as never[] },
      { data: [{ x: 0, y: 0.2, yMin: 0.15, yMax: 0.25 }] as never[], hidden: true },
      { data: [{ x: 2, y: 0.4, yMin: 0.36, yMax: 0.44 }] as never[] },
    ];
    expect(errorBarRange(datasets)).toEqual({ min: 0.29, max: 0.44 });
  });

  it('is null when no point has a bar', () => {
    expect(errorBarRange([{ data: [{ x: 0, y: 1 }] as never[] }])).toBeNull();
    expect(errorBarRange([])).toBeNull();
  });
});
