import { MILE_PER_HOUR } from '@tunnelwright/aero';
import type { FullScaleEstimate, ReviewRun, TestReview } from '@tunnelwright/contracts';
import { PointExclusion, Reduction, Run, TestArticle, TestRecord } from '@tunnelwright/db';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { HEADER } from '../../../scripts/make-bad-run-files';
import { createIngestWorld, type IngestWorld } from './support/ingest-world';

/** One set condition of an invented run file: yaw (deg), dynamic pressure (Pa) and axial force Fx (N). */
interface Condition {
  yaw: number;
  q: number;
  fx: number;
}

/**
 * A run file at 1013.25 hPa, 20.5 °C and 45 % RH with three samples per point; Fx varies by ±0.01 N about its
 * value so each point has a random uncertainty, and its mean is the value given. Side and normal forces are zero.
 */
function runFile(conditions: Condition[]): Buffer {
  const rows: string[] = [];
  let time = 0;
  conditions.forEach((c, i) => {
    for (const delta of [-0.01, 0, 0.01]) {
      rows.push([(time++ * 0.01).toFixed(2), i + 1, c.yaw.toFixed(1), '0.0', c.q.toFixed(6), '1013.25', '20.5', '45', (c.fx + delta).toFixed(6), '0', '0', '0', '0', '0'].join(', '));
    }
  });
  return Buffer.from(`# note: review test\n${HEADER}\n${rows.join('\n')}\n`);
}

const relative = (actual: number, expected: number) => Math.abs(actual / expected - 1);

describe('review routes', () => {
  let w: IngestWorld;
  const auth = (token: string) => ({ Authorization: `Bearer ${token}` });

  /** A test whose article and reduction settings are set for the case, and a run of the given kind on it. */
  async function testWithRun(article: Partial<TestArticle>, kind: Run['kind'] = 'data'): Promise<{ testId: string; runId: string }> {
    const testId = await w.newTest();
    const test = await TestRecord.query(w.t.knex).findById(testId);
    if (!test) throw new Error('test missing');
    await TestArticle.query(w.t.knex).patch(article).where('id', test.articleId);
    await TestRecord.query(w.t.knex)
      .patch({ reductionSettings: { minimumSamplesPerPoint: 3, corrections: { solidBlockage: 'none', wakeBlockage: 'none' }, uncertainty: { loads: [0.02, 0.02, 0.05, 0.01, 0.01, 0.01], dynamicPressure: 1 } } })
      .where('id', testId);
    const runId = await w.newRun(testId);
    if (kind !== 'data') await Run.query(w.t.knex).patch({ kind }).where('id', runId);
    return { testId, runId };
  }

  async function uploadAndSettle(runId: string, bytes: Buffer): Promise<string> {
    const upload = await w.upload(runId, bytes, 'review.csv');
    expect(upload.status, JSON.stringify(upload.body)).toBe(202);
    const reduction = await w.settle(upload.body.reduction.id);
    expect(reduction.state, reduction.errorMessage ?? '').toBe('done');
    return reduction.id;
  }

  async function review(testId: string, query: Record<string, string> = {}): Promise<request.Response> {
    return request(w.t.app).get(`/api/review/tests/${testId}`).query(query).set(auth(w.analyst.token));
  }

  async function fullScale(reductionId: string, body: object): Promise<request.Response> {
    return request(w.t.app).post(`/api/review/reductions/${reductionId}/full-scale`).set(auth(w.analyst.token)).send(body);
  }

  beforeAll(async () => {
    w = await createIngestWorld();
  });
  afterAll(() => w?.close());

  describe('GET /api/review/tests/:id', () => {
    /** Yaw 0° to 10° with the same q and Fx at every yaw: a constant body-axis C_D. */
    const yawSweep = [0, 2, 4, 6, 8, 10].map((yaw) => ({ yaw, q: 600, fx: 9 }));
    let testId: string;
    let runId: string;
    let firstVersion: string;

    beforeAll(async () => {
      ({ testId, runId } = await testWithRun({ scale: 5, referenceArea: 0.14, referenceLength: 0.7 }));
      firstVersion = await uploadAndSettle(runId, runFile(yawSweep));
    });

    it('200: each point with corrected C_D, C_L, C_Y and U (k = 2) from the stored engine result, drag counts and the caution', async () => {
      const response = await review(testId);
      expect(response.status, JSON.stringify(response.body)).toBe(200);
      const body = response.body as TestReview;
      expect(body.caution).toMatch(/not design loads/);
      expect(body.runs).toHaveLength(1);
      const [run] = body.runs;
      expect(run.versions.map((v) => [v.version, v.pointCount, v.frozen])).toEqual([[1, 6, false]]);
      const selected = run.selected as NonNullable<ReviewRun['selected']>;
      expect(selected.reductionId).toBe(firstVersion);
      expect(selected.points.map((p) => p.yaw)).toEqual([0, 2, 4, 6, 8, 10]);

      const full = await request(w.t.app).get(`/api/reductions/${firstVersion}/points`).query({ full: 'true' }).set(auth(w.analyst.token));
      for (const [i, point] of selected.points.entries()) {
        const stored = full.body.items[i].result.corrected;
        expect(point.dragCoefficient?.value).toBe(stored.dragCoefficient.value);
        expect(point.sideForceCoefficient?.value).toBe(stored.sideForceCoefficient.value);
        // GUM (JCGM 100:2008, ch. 6): the expanded uncertainty is U = k·u_c with k = 2.
        for (const key of ['dragCoefficient', 'liftCoefficient', 'sideForceCoefficient'] as const) {
          const u = stored[key].uncertainty;
          expect(point[key]?.expandedUncertainty).toBeGreaterThan(0);
          expect(relative(point[key]?.expandedUncertainty as number, 2 * u.combinedStandardUncertainty)).toBeLessThan(1e-12);
        }
        // A drag count is 0.0001 in C_D (common practice).
        expect(relative(point.dragCounts as number, (point.dragCoefficient?.value as number) * 1e4)).toBeLessThan(1e-12);
        expect(point.exclusion).toBeNull();
      }
      // Body-to-wind axes with Fy = Fz = 0 (Etkin, from memory): C_D = C_A·cos β, so wind-axis drag falls as cos(yaw).
      const cd = selected.points.map((p) => p.dragCoefficient?.value as number);
      expect(relative(cd[5], cd[0] * Math.cos((10 * Math.PI) / 180))).toBeLessThan(1e-9);
    });

    it('shows an exclusion with its reason and who made it, the point still listed', async () => {
      const exclude = await request(w.t.app).put(`/api/reductions/${firstVersion}/points/2/exclusion`).set(auth(w.analyst.token)).send({ reason: 'Turntable still settling at this yaw' });
      expect(exclude.status, JSON.stringify(exclude.body)).toBe(200);
      const body = (await review(testId)).body as TestReview;
      const points = body.runs[0].selected?.points ?? [];
      expect(points).toHaveLength(6);
      expect(points[2].exclusion).toMatchObject({ reason: 'Turntable still settling at this yaw', excludedBy: { id: w.analyst.id, name: w.analyst.name } });
      expect(points.filter((p) => p.exclusion !== null)).toHaveLength(1);
      const restore = await request(w.t.app).delete(`/api/reductions/${firstVersion}/points/2/exclusion`).set(auth(w.analyst.token));
      expect(restore.status).toBe(204);
      expect(((await review(testId)).body as TestReview).runs[0].selected?.points[2].exclusion).toBeNull();
    });

    it('lists versions newest first, shows the newest by default and another on request; 400 for a version of another test', async () => {
      const again = await request(w.t.app).post(`/api/runs/${runId}/reductions`).set(auth(w.analyst.token)).send({ referenceArea: 0.28 });
      expect(again.status, JSON.stringify(again.body)).toBe(202);
      await w.settle(again.body.id);
      const latest = (await review(testId)).body as TestReview;
      expect(latest.runs[0].versions.map((v) => v.version)).toEqual([2, 1]);
      expect(latest.runs[0].selected?.version).toBe(2);
      const older = (await review(testId, { reductionIds: firstVersion })).body as TestReview;
      expect(older.runs[0].selected?.reductionId).toBe(firstVersion);
      // Twice the reference area halves every coefficient (C = F/(qS)).
      const [v2, v1] = [latest.runs[0].selected?.points[0].dragCoefficient?.value as number, older.runs[0].selected?.points[0].dragCoefficient?.value as number];
      expect(relative(v2, v1 / 2)).toBeLessThan(1e-12);

      const other = await testWithRun({ scale: 1 });
      const foreign = await uploadAndSettle(other.runId, runFile(yawSweep.slice(0, 2)));
      const refused = await review(testId, { reductionIds: foreign });
      expect(refused.status).toBe(400);
      expect(refused.body.errors).toEqual([{ field: 'reductionIds', message: expect.stringContaining('not a finished reduction of this test') }]);
      const garbage = await review(testId, { reductionIds: 'v1' });
      expect(garbage.status).toBe(400);
      expect(garbage.body.errors[0]).toMatchObject({ field: 'reductionIds', message: expect.stringContaining('"v1" is not a reduction id') });
    });

    it('gives per-point warnings: points below the configured sample count say so', async () => {
      const { testId: fewTest, runId: fewRun } = await testWithRun({ scale: 1 });
      await TestRecord.query(w.t.knex).patch({ reductionSettings: { minimumSamplesPerPoint: 5, corrections: { solidBlockage: 'none', wakeBlockage: 'none' } } }).where('id', fewTest);
      await uploadAndSettle(fewRun, runFile(yawSweep.slice(0, 3)));
      const points = ((await review(fewTest)).body as TestReview).runs[0].selected?.points ?? [];
      expect(points).toHaveLength(3);
      for (const point of points) expect(point.warnings.map((warning) => warning.code)).toContain('FEW_SAMPLES');
    });

    it('marks an approved reduction frozen', async () => {
      const { testId: frozenTest, runId: frozenRun } = await testWithRun({ scale: 1 });
      const id = await uploadAndSettle(frozenRun, runFile(yawSweep.slice(0, 2)));
      await Reduction.query(w.t.knex).patch({ approvedAt: new Date() }).where('id', id);
      const run = ((await review(frozenTest)).body as TestReview).runs[0];
      expect(run.versions[0].frozen).toBe(true);
      expect(run.selected?.frozen).toBe(true);
    });

    it('404 for an unknown test; 403 for a customer', async () => {
      expect((await review('00000000-0000-4000-8000-000000000000')).status).toBe(404);
      const customer = await request(w.t.app).get(`/api/review/tests/${testId}`).set(auth(w.customer.token));
      expect(customer.status).toBe(403);
    });
  });

  describe('sphere calibration runs', () => {
    // An invented 150 mm sphere in a tunnel whose drag crisis comes early: target C_D at each speed, Fx = C_D·q·S.
    const diameter = 0.15;
    const area = (Math.PI / 4) * diameter * diameter;
    const targets = [
      { speed: 15, cd: 0.47 },
      { speed: 19, cd: 0.46 },
      { speed: 23, cd: 0.42 },
      { speed: 26, cd: 0.35 },
      { speed: 29, cd: 0.2 },
      { speed: 32, cd: 0.1 },
      { speed: 36, cd: 0.09 },
    ];
    let testId: string;
    let reductionId: string;

    beforeAll(async () => {
      let runId: string;
      ({ testId, runId } = await testWithRun({ referenceArea: area, referenceLength: diameter, frontalArea: null, scale: 1 }, 'sphere_calibration'));
      const conditions = targets.map(({ speed, cd }) => {
        const q = 0.5 * 1.2 * speed * speed;
        return { yaw: 0, q, fx: cd * q * area };
      });
      reductionId = await uploadAndSettle(runId, runFile(conditions));
    });

    it('plots published sphere curves over the run’s Re range and gives Re_crit and the turbulence factor', async () => {
      const run = ((await review(testId)).body as TestReview).runs[0];
      const selected = run.selected as NonNullable<ReviewRun['selected']>;
      const measured = selected.points.map((p) => ({ re: p.reynoldsNumber as number, cd: p.dragCoefficient?.value as number }));
      for (const [i, point] of measured.entries()) expect(Math.abs(point.cd - targets[i].cd)).toBeLessThan(1e-6);
      const sphere = selected.sphere;
      if (!sphere || sphere.criticalReynoldsNumber === null) throw new Error(`no critical Re: ${sphere?.reason}`);

      const low = Math.min(...measured.map((p) => p.re));
      const high = Math.max(...measured.map((p) => p.re));
      const morrison = sphere.referenceCurves.find((c) => c.id === 'sphere-morrison');
      expect(morrison?.points[0].reynoldsNumber).toBe(low);
      expect(morrison?.points.at(-1)?.reynoldsNumber).toBe(high);
      // Morrison 2013: the correlation falls through C_D = 0.3 at Re = 2.518e5; read off the sampled curve by
      // log-linear interpolation between its two bracketing samples, to 0.5 %.
      const pts = morrison?.points ?? [];
      const k = pts.findIndex((p, i) => i > 0 && pts[i - 1].dragCoefficient >= 0.3 && p.dragCoefficient < 0.3);
      const [a, b] = [pts[k - 1], pts[k]];
      const crossing = Math.exp(Math.log(a.reynoldsNumber) + ((a.dragCoefficient - 0.3) / (a.dragCoefficient - b.dragCoefficient)) * Math.log(b.reynoldsNumber / a.reynoldsNumber));
      expect(relative(crossing, 2.518e5)).toBeLessThan(0.005);
      // Clift–Gauvin is stated valid to Re 3e5 and White's sphere fit to 2e5: their curves stop there.
      expect(sphere.referenceCurves.find((c) => c.id === 'sphere-clift-gauvin')?.points.at(-1)?.reynoldsNumber).toBe(3e5);
      expect(sphere.referenceCurves.find((c) => c.id === 'sphere-white')?.points.at(-1)?.reynoldsNumber).toBe(2e5);

      // Barlow, Rae & Pope 1999, ch. 4 (from memory): Re_crit where the measured C_D falls through 0.3, here between
      // the 0.35 and 0.2 points, interpolated linearly in ln Re; TF = 385 000/Re_crit.
      const [p, q] = [measured[3], measured[4]];
      const expected = Math.exp(Math.log(p.re) + ((0.35 - 0.3) / (0.35 - 0.2)) * Math.log(q.re / p.re));
      expect(relative(sphere.criticalReynoldsNumber, expected)).toBeLessThan(1e-6);
      expect(relative(sphere.turbulenceFactor as number, 385_000 / expected)).toBeLessThan(1e-6);
      expect(sphere.source).toMatch(/Barlow, Rae & Pope/);
    });

    it('leaves excluded points out of Re_crit', async () => {
      await PointExclusion.query(w.t.knex).insert({ reductionId, pointIndex: 4, reason: 'Sphere support vibrating at this speed', excludedBy: w.analyst.id });
      const selected = ((await review(testId)).body as TestReview).runs[0].selected as NonNullable<ReviewRun['selected']>;
      const [p, q] = [selected.points[3], selected.points[5]];
      // Without the 0.2 point the crossing lies between the 0.35 and 0.1 points (same method as above).
      const expected = Math.exp(Math.log(p.reynoldsNumber as number) + ((0.35 - 0.3) / (0.35 - 0.1)) * Math.log((q.reynoldsNumber as number) / (p.reynoldsNumber as number)));
      expect(relative(selected.sphere?.criticalReynoldsNumber as number, expected)).toBeLessThan(1e-6);
      await PointExclusion.query(w.t.knex).delete().where({ reductionId, pointIndex: 4 });
    });

    it('data runs carry no sphere section', async () => {
      const { testId: dataTest, runId } = await testWithRun({ scale: 1 });
      await uploadAndSettle(runId, runFile([{ yaw: 0, q: 600, fx: 9 }]));
      expect(((await review(dataTest)).body as TestReview).runs[0].selected?.sphere).toBeNull();
    });
  });

  describe('POST /api/review/reductions/:id/full-scale', () => {
    // 1:5 model, S = 0.14 m², L = 0.7 m; the same q and Fx at every yaw from 0° to 10°, so the body-axis C_D is constant.
    const scale = 5;
    let reductionId: string;
    let axial: number;
    let meanReynolds: number;

    beforeAll(async () => {
      const { runId } = await testWithRun({ scale, referenceArea: 0.14, referenceLength: 0.7 });
      reductionId = await uploadAndSettle(runId, runFile([0, 2, 4, 6, 8, 10].map((yaw) => ({ yaw, q: 600, fx: 9 }))));
      const full = await request(w.t.app).get(`/api/reductions/${reductionId}/points`).query({ full: 'true' }).set(auth(w.analyst.token));
      axial = full.body.items[0].result.corrected.axialForceCoefficient.value;
      for (const item of full.body.items) expect(item.result.corrected.axialForceCoefficient.value).toBe(axial);
      meanReynolds = full.body.items.reduce((sum: number, item: { reynoldsNumber: number }) => sum + item.reynoldsNumber, 0) / full.body.items.length;
    });

    it('wind-averaged C_D: with a constant C_D it is C_D·(1 + (V_w/V)²)', async () => {
      const response = await fullScale(reductionId, { groundSpeed: 25, windSpeed: 4, windDirection: 0 });
      expect(response.status, JSON.stringify(response.body)).toBe(200);
      const body = response.body as FullScaleEstimate;
      // SAE J1252 (from memory): 55 mph vehicle, 7 mph wind; constant C_D gives C_D·(1 + (7/55)²).
      expect(relative(body.windAveraged.standard.dragCoefficient as number, axial * (1 + (7 / 55) ** 2))).toBeLessThan(1e-9);
      expect(relative(body.windAveraged.standard.vehicleSpeed, 55 * 0.44704)).toBeLessThan(1e-12);
      expect(relative(body.windAveraged.atCondition.dragCoefficient as number, axial * (1 + (4 / 25) ** 2))).toBeLessThan(1e-9);
      expect(body.caution).toMatch(/not design loads/);
    });

    it('head and tail wind: D = ½ρV_r²·C_D·λ²S and P = D·V_ground at ISA sea-level density', async () => {
      // Definitions q = ½ρV², D = q·C_D·A, P = D·V; ρ = 1.225 kg/m³ (ISA sea level, from memory); A = λ²S = 25 × 0.14 m².
      const dragArea = axial * scale * scale * 0.14;
      const head = (await fullScale(reductionId, { groundSpeed: 25, windSpeed: 4, windDirection: 0 })).body as FullScaleEstimate;
      expect(relative(head.referenceArea, 3.5)).toBeLessThan(1e-12);
      expect(relative(head.condition.drag as number, 0.5 * 1.225 * 29 * 29 * dragArea)).toBeLessThan(1e-12);
      expect(relative(head.condition.power as number, 0.5 * 1.225 * 29 * 29 * dragArea * 25)).toBeLessThan(1e-12);
      const tail = (await fullScale(reductionId, { groundSpeed: 25, windSpeed: 4, windDirection: 180 })).body as FullScaleEstimate;
      expect(relative(tail.condition.power as number, 0.5 * 1.225 * 21 * 21 * dragArea * 25)).toBeLessThan(1e-12);
      // The series runs 0° to 360° in 5° steps, is the same either side of the heading, and matches the condition at 0° and 180°.
      expect(head.powerByDirection.map((p) => p.windDirection)).toEqual(Array.from({ length: 73 }, (_, i) => i * 5));
      expect(head.powerByDirection[0].power).toBeCloseTo(head.condition.power as number, 9);
      expect(head.powerByDirection[36].power).toBeCloseTo(tail.condition.power as number, 9);
      expect(head.powerByDirection[9].power).toBeCloseTo(head.powerByDirection[63].power as number, 9);
    });

    it('relative wind reproduces the 40 CFR 1037.528 example: 7.1 mph at 47° on 64.9 mph → 69.93 mph at 4.26°', async () => {
      // 40 CFR 1037.528 worked example; the printed values are rounded to 0.01 mph and 0.01°.
      const body = (await fullScale(reductionId, { groundSpeed: 64.9 * MILE_PER_HOUR, windSpeed: 7.1 * MILE_PER_HOUR, windDirection: 47 })).body as FullScaleEstimate;
      expect(Math.abs(body.condition.airSpeed / MILE_PER_HOUR - 69.93)).toBeLessThan(0.01);
      expect(Math.abs(body.condition.yawAngle - 4.26)).toBeLessThan(0.005);
      expect(body.condition.dragCoefficient).toBeCloseTo(axial, 12);
    });

    it('Reynolds-number ratio: model Re over ρ·V_r·λL/μ at ISA sea level, with a note', async () => {
      const body = (await fullScale(reductionId, { groundSpeed: 25, windSpeed: 4, windDirection: 0 })).body as FullScaleEstimate;
      // Re = ρVL/μ (definition); μ(288.15 K) = 1.78938e-5 Pa·s by Sutherland (US Standard Atmosphere 1976, from memory).
      const fullRe = (1.225 * 29 * 0.7 * scale) / 1.78938e-5;
      expect(relative(body.reynoldsNumberRatio.fullScaleReynoldsNumber, fullRe)).toBeLessThan(1e-4);
      expect(relative(body.reynoldsNumberRatio.modelReynoldsNumber, meanReynolds)).toBeLessThan(1e-12);
      expect(body.reynoldsNumberRatio.ratio).toBeLessThan(1);
      expect(body.reynoldsNumberRatio.note).toMatch(/lower Reynolds number.*may not capture full-scale behaviour/);
    });

    it('entered air: dry air by the ideal-gas law, checked against the US Standard Atmosphere at 1000 m', async () => {
      const dragArea = axial * scale * scale * 0.14;
      const isa = (await fullScale(reductionId, { groundSpeed: 25, windSpeed: 4, windDirection: 0 })).body as FullScaleEstimate;
      expect(isa.air).toEqual({ density: 1.225, temperature: 288.15, pressure: 101325, standard: true });
      // US Standard Atmosphere 1976 at 1000 m geopotential (from memory): 898.76 hPa, 281.65 K (8.5 °C), ρ = 1.1117 kg/m³.
      const response = await fullScale(reductionId, { groundSpeed: 25, windSpeed: 4, windDirection: 0, airTemperature: 8.5, airPressure: 898.76 });
      expect(response.status, JSON.stringify(response.body)).toBe(200);
      const high = response.body as FullScaleEstimate;
      expect(high.air.standard).toBe(false);
      expect(high.air.temperature).toBeCloseTo(281.65, 9);
      expect(high.air.pressure).toBeCloseTo(89876, 6);
      expect(relative(high.air.density, 1.1117)).toBeLessThan(5e-4);
      // D = ½ρV_r²·C_D·A (definition) with the entered density; the relative wind does not depend on the air.
      expect(relative(high.condition.drag as number, 0.5 * high.air.density * 29 * 29 * dragArea)).toBeLessThan(1e-12);
      expect(relative((high.condition.power as number) / (isa.condition.power as number), high.air.density / 1.225)).toBeLessThan(1e-12);
      // Re scales with ρ/μ; μ by Sutherland at 281.65 K is 1.7579e-5 Pa·s (US Standard Atmosphere 1976 table, from memory).
      expect(relative(high.reynoldsNumberRatio.fullScaleReynoldsNumber, (high.air.density * 29 * 0.7 * scale) / 1.7579e-5)).toBeLessThan(5e-4);
      // Only the temperature entered: the pressure stays at ISA sea level, ρ = 101325 / (287.05 × 308.15) (ideal gas, common practice).
      const hot = (await fullScale(reductionId, { groundSpeed: 25, airTemperature: 35 })).body as FullScaleEstimate;
      expect(relative(hot.air.density, 101325 / (287.05 * 308.15))).toBeLessThan(1e-12);
      const cold = await fullScale(reductionId, { groundSpeed: 25, airTemperature: -60, airPressure: 1200 });
      expect(cold.status).toBe(400);
      expect(cold.body.errors).toEqual(
        expect.arrayContaining([
          { field: 'airTemperature', message: 'Air temperature must be between −40 °C and 55 °C' },
          { field: 'airPressure', message: 'Air pressure must be between 700 hPa and 1100 hPa' },
        ]),
      );
    });

    it('a crosswind past the measured yaw gives no figure, and says why', async () => {
      // 15 m/s across a 10 m/s vehicle meets it at atan(15/10) = 56° (vector addition), beyond the 10° sweep.
      const body = (await fullScale(reductionId, { groundSpeed: 10, windSpeed: 15, windDirection: 90 })).body as FullScaleEstimate;
      expect(body.condition.power).toBeNull();
      expect(body.condition.reason).toMatch(/cover yaw 0° to ±10.0°; this wind meets the vehicle at 56.3°/);
      expect(body.windAveraged.atCondition.dragCoefficient).toBeNull();
      expect(body.windAveraged.atCondition.reason).toMatch(/yaw sweep/);
    });

    it('400 with the field and a plain message for bad input', async () => {
      const missing = await fullScale(reductionId, {});
      expect(missing.status).toBe(400);
      expect(missing.body.errors).toEqual([{ field: 'groundSpeed', message: 'Ground speed must be a number in m/s' }]);
      const bad = await fullScale(reductionId, { groundSpeed: -3, windSpeed: 2, windDirection: 400 });
      expect(bad.status).toBe(400);
      expect(bad.body.errors).toEqual(
        expect.arrayContaining([
          { field: 'groundSpeed', message: 'Ground speed must be greater than zero' },
          { field: 'windDirection', message: 'Wind direction must be between 0° and 360°' },
        ]),
      );
      const overtaking = await fullScale(reductionId, { groundSpeed: 5, windSpeed: 8, windDirection: 180 });
      expect(overtaking.status).toBe(400);
      expect(overtaking.body.errors[0]).toMatchObject({ field: 'windSpeed', message: expect.stringContaining('from behind') });
    });

    it('leaves excluded points out and counts them; 404 unknown reduction; 403 customer', async () => {
      await PointExclusion.query(w.t.knex).insert({ reductionId, pointIndex: 5, reason: 'Yaw 10° point taken twice by mistake', excludedBy: w.analyst.id });
      const body = (await fullScale(reductionId, { groundSpeed: 10, windSpeed: 1.7, windDirection: 90 })).body as FullScaleEstimate;
      expect(body.excludedPoints).toBe(1);
      // atan(1.7/10) = 9.65° is inside 0–10° but past the 8° the kept points reach.
      expect(body.condition.power).toBeNull();
      await PointExclusion.query(w.t.knex).delete().where({ reductionId, pointIndex: 5 });
      expect((await fullScale('00000000-0000-4000-8000-000000000000', { groundSpeed: 10 })).status).toBe(404);
      const customer = await request(w.t.app).post(`/api/review/reductions/${reductionId}/full-scale`).set(auth(w.customer.token)).send({ groundSpeed: 10 });
      expect(customer.status).toBe(403);
    });
  });
});
