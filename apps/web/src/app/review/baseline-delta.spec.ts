import { baselineDeltas, DRAG_COUNT } from './baseline-delta';
import { reviewPoint, reviewRun, sampleExclusion } from './review-test-data';

describe('baselineDeltas', () => {
  const baseline = reviewRun(1, [reviewPoint(0, 0, 0.3, 0.002), reviewPoint(1, 5, 0.31, 0.002), reviewPoint(2, 5.1, 0.312, 0.002), reviewPoint(3, 10, 0.33, 0.002)]);

  it('counts 1 drag count as 0.0001 in C_D', () => {
    // Common practice in road-vehicle and aircraft aerodynamics: one drag count is ΔC_D = 0.0001.
    expect(DRAG_COUNT).toBe(1e-4);
  });

  it('gives ΔC_D in counts at matching yaw, averaging baseline repeats within the tolerance', () => {
    const other = reviewRun(2, [reviewPoint(0, 10.1, 0.325, 0.002), reviewPoint(1, 0.02, 0.2985, 0.002), reviewPoint(2, 4.95, 0.3141, 0.002)], 'spoiler');
    const rows = baselineDeltas(baseline, [baseline, other]);
    expect(rows.map((r) => [r.pointNumber, r.yaw])).toEqual([
      [2, 0.02],
      [3, 4.95],
      [1, 10.1],
    ]);
    // (0.2985 − 0.3)/0.0001 = −15; at 5° the baseline's 5.0° and 5.1° repeats average to 0.311, so +31; (0.325 − 0.33)/0.0001 = −50.
    expect(rows[0].deltaCounts).toBeCloseTo(-15, 9);
    expect(rows[1].baselineDragCoefficient).toBeCloseTo(0.311, 12);
    expect(rows[1].deltaCounts).toBeCloseTo(31, 9);
    expect(rows[2].deltaCounts).toBeCloseTo(-50, 9);
    expect(rows.every((r) => r.runLabel === 'Run 2 spoiler v1')).toBe(true);
  });

  it('says when the baseline has no point at a yaw, and never compares the baseline with itself', () => {
    const other = reviewRun(2, [reviewPoint(0, 2.5, 0.3, 0.002)]);
    const rows = baselineDeltas(baseline, [baseline, other]);
    expect(rows).toHaveLength(1);
    expect(rows[0].baselineDragCoefficient).toBeNull();
    expect(rows[0].deltaCounts).toBeNull();
  });

  it('leaves excluded points out on both sides', () => {
    const withExclusion = reviewRun(1, [reviewPoint(0, 0, 0.3, 0.002, { exclusion: sampleExclusion }), reviewPoint(1, 5, 0.31, 0.002)]);
    const other = reviewRun(2, [reviewPoint(0, 0, 0.29, 0.002), reviewPoint(1, 5, 0.3, 0.002, { exclusion: sampleExclusion })]);
    const rows = baselineDeltas(withExclusion, [other]);
    expect(rows).toHaveLength(1);
    expect(rows[0].deltaCounts).toBeNull();
  });
});
