/**
 * Round trip: a run is generated in this file from chosen corrected coefficients and known corrections by
 * inverting the engine's steps independently (corrected → uncorrected loads → body/balance axes → tares and
 * zeros → bridge outputs), then reduced; the coefficients must come back to 1e-9 relative.
 * The inverse steps are written out here from the published formulas, never by calling the engine.
 */
import { describe, expect, it } from 'vitest';
import { parseReductionConfig } from '../config';
import { reduceRun } from './reduce-run';
import type { PointResult } from './reduction-result';

const DEG = Math.PI / 180;
const rel = (actual: number, expected: number) => Math.abs(actual - expected) / Math.abs(expected);

interface Chosen {
  yawDeg: number;
  pitchDeg: number;
  q: number;
  CD: number;
  CL: number;
  CY: number;
  Cl: number;
  Cm: number;
  Cn: number;
}

/** Corrected coefficients chosen for a yaw sweep: C_D(ψ) = 0.31 + 0.5ψ², C_Y ∝ ψ (invented vehicle). */
function sweep(q: number): Chosen[] {
  return [-8, -4, 0, 4, 8].map((yawDeg, i) => {
    const psi = yawDeg * DEG;
    return { yawDeg, pitchDeg: 1.5 - 0.5 * i, q: q + 7 * i, CD: 0.31 + 0.5 * psi * psi, CL: 0.09 + 0.4 * psi * psi, CY: 2.0 * psi + 0.003, Cl: 0.3 * psi + 0.001, Cm: -0.045, Cn: 0.5 * psi - 0.002 };
  });
}

/**
 * Wind axes → body axes: the transpose of D = A cosα cosβ + N sinα cosβ − Y sinβ, L = N cosα − A sinα,
 * Y_w = A cosα sinβ + N sinα sinβ + Y cosβ (Etkin 1972; Stevens & Lewis 2003 — from memory), β = −ψ.
 */
function windToBody(D: number, L: number, Yw: number, alpha: number, beta: number): { A: number; Y: number; N: number } {
  const ca = Math.cos(alpha), sa = Math.sin(alpha), cb = Math.cos(beta), sb = Math.sin(beta);
  return { A: D * ca * cb - L * sa + Yw * ca * sb, Y: -D * sb + Yw * cb, N: D * sa * cb + L * ca + Yw * sa * sb };
}

/** Balance-centre moments from reference-centre moments: M_bal = M_ref − r × F (rigid-body statics). */
function toBalanceCentre(F: number[], M: number[], r: number[]): number[] {
  const [fx, fy, fz] = F;
  return [M[0] - (r[1] * fz - r[2] * fy), M[1] - (r[2] * fx - r[0] * fz), M[2] - (r[0] * fy - r[1] * fx)];
}

/** Weight tare, linear in yaw and pitch (deg), so the engine's bilinear interpolation must return it exactly. */
function tareAt(yawDeg: number, pitchDeg: number): number[] {
  return [0.3 + 0.02 * yawDeg, -0.1 + 0.05 * yawDeg, -2.4 + 0.03 * pitchDeg, 0.01 * yawDeg, 0.4 + 0.01 * pitchDeg, -0.002 * yawDeg];
}
const TARE_YAW = [-12, 12];
const TARE_PITCH = [-5, 5];
const TARE_TABLE = TARE_YAW.map((y) => TARE_PITCH.map((p) => tareAt(y, p)));

/** A run file text: canonical columns, each point repeated `copies` times, numbers in round-trip form. */
function runFile(header: string, metadata: string[], rows: (string | number)[][], copies = 3): string {
  const lines = [...metadata, header];
  let t = 0;
  rows.forEach((row) => {
    for (let k = 0; k < copies; k++) lines.push([(t++ * 0.01).toFixed(2), ...row].map(String).join(', '));
  });
  return lines.join('\n') + '\n';
}

function expectRecovered(points: PointResult[], chosen: Chosen[]): void {
  expect(points).toHaveLength(chosen.length);
  points.forEach((p, i) => {
    const c = chosen[i];
    expect(rel(p.corrected.dragCoefficient.value, c.CD)).toBeLessThan(1e-9);
    expect(rel(p.corrected.liftCoefficient.value, c.CL)).toBeLessThan(1e-9);
    expect(rel(p.corrected.sideForceCoefficient.value, c.CY)).toBeLessThan(1e-9);
    expect(rel(p.corrected.rollingMomentCoefficient.value, c.Cl)).toBeLessThan(1e-9);
    expect(rel(p.corrected.pitchingMomentCoefficient.value, c.Cm)).toBeLessThan(1e-9);
    expect(rel(p.corrected.yawingMomentCoefficient.value, c.Cn)).toBeLessThan(1e-9);
    expect(p.corrected.dragCoefficient.referenceAreaKind).toBe('frontal');
  });
}

describe('reduceRun round trip', () => {
  it('closed section: Thom solid + streamlined wake blockage, horizontal buoyancy, tares, zero, moment transfer', async () => {
    const C = 4.32, tau = 0.86, K = 0.96, volume = 0.105, S = 0.1375, Lref = 0.72, dpdx = -1.8;
    const offset = [0.12, -0.03, -0.18];
    const zero = [0.42, -0.18, 1.35, 0.011, -0.023, 0.004];
    const config = parseReductionConfig({
      tunnel: { kind: 'closed', sectionArea: C, tunnelShapeFactor: tau, pressureGradient: dpdx },
      article: { referenceArea: S, referenceAreaKind: 'frontal', referenceLength: Lref, modelVolume: volume, bodyShapeFactor: K },
      balance: { centreOffset: offset },
      zeros: { loads: zero, tare: { yaw: TARE_YAW, pitch: TARE_PITCH, loads: TARE_TABLE } },
      corrections: { solidBlockage: 'thom', wakeBlockage: 'streamlined', horizontalBuoyancy: true },
      minimumSamplesPerPoint: 1,
    });
    // Barlow, Rae & Pope 1999 ch. 10: ε_sb = K·τ1·V/C^1.5; ε_wb = (S/4C)·C_Du; q_c = q_u(1 + ε_sb + ε_wb)²;
    // C_Dc = C_Du/(1 + ε_t)²; horizontal buoyancy ΔD_B = −(dp/dx)·V is removed from the measured drag first.
    const epsSolid = (K * tau * volume) / C ** 1.5;
    const buoyancy = -dpdx * volume;
    const chosen = sweep(1480);
    const expected: { epsWake: number; qc: number }[] = [];
    const rows = chosen.map((c) => {
      // Solve C_Dc = x/(1 + ε_sb + S·x/(4C))² for the buoyancy-free uncorrected x by Newton's method.
      let x = c.CD;
      for (let k = 0; k < 50; k++) {
        const g = 1 + epsSolid + (S * x) / (4 * C);
        const f = x / (g * g) - c.CD;
        const df = 1 / (g * g) - (2 * x * S) / (4 * C * g * g * g);
        x -= f / df;
      }
      const epsWake = (S * x) / (4 * C);
      const qc = c.q * (1 + epsSolid + epsWake) ** 2;
      expected.push({ epsWake, qc });
      const drag = x * c.q * S + buoyancy;
      const body = windToBody(drag, c.CL * qc * S, c.CY * qc * S, c.pitchDeg * DEG, -c.yawDeg * DEG);
      const forces = [body.A, body.Y, body.N];
      const moments = toBalanceCentre(forces, [c.Cl * qc * S * Lref, c.Cm * qc * S * Lref, c.Cn * qc * S * Lref], offset);
      const tare = tareAt(c.yawDeg, c.pitchDeg);
      const loads = [...forces, ...moments].map((f, i) => f + tare[i] + zero[i]);
      // Air state in file units: hPa, °C, %.
      return [1 + chosen.indexOf(c), c.yawDeg, c.pitchDeg, c.q, 1008.6, 21.3, 48, ...loads];
    });
    const text = runFile(
      'time [s], point, yaw [deg], pitch [deg], q [Pa], p_baro [hPa], T_air [degC], RH [%], Fx [N], Fy [N], Fz [N], Mx [N m], My [N m], Mz [N m]',
      ['# run: rt-closed (invented)'],
      rows,
    );
    const result = await reduceRun([Buffer.from(text)], config, { fileName: 'rt-closed.csv' });
    expectRecovered(result.points, chosen);
    result.points.forEach((p, i) => {
      expect(rel(p.corrections.solidBlockage, epsSolid)).toBeLessThan(1e-12);
      expect(rel(p.corrections.wakeBlockage, expected[i].epsWake)).toBeLessThan(1e-9);
      expect(rel(p.correctedDynamicPressure, expected[i].qc)).toBeLessThan(1e-9);
      expect(rel(p.corrections.buoyancyDrag, buoyancy)).toBeLessThan(1e-12);
      expect(p.corrections.solidBlockageMethod).toBe('thom');
      expect(p.corrections.wakeBlockageMethod).toBe('streamlined');
    });
    expect(result.warnings).toEqual([]);
  });

  it('open jet: bridge outputs through an interacting balance, q from Δp_ref and q factor, facility ε constants', async () => {
    const S = 0.352, Lref = 1.16, volume = 0.46, dpdx = -0.9, qFactor = 1.0235;
    const eps = { jetExpansion: -0.0105, nozzleBlockage: 0.0042, collectorBlockage: 0.0018 };
    const offset = [0.05, 0, -0.12];
    const bridgeZero = [0.012, -0.008, 0.021, 0.003, -0.005, 0.002];
    const C1 = [
      [2.0e-3, 2.0e-5, -1.5e-5, 0, 1.0e-5, 0],
      [1.0e-5, 2.0e-3, 0, 2.0e-5, 0, -1.0e-5],
      [-1.0e-5, 0, 5.0e-4, 0, 5.0e-6, 0],
      [0, 3.0e-5, 0, 3.0e-3, 0, 2.0e-5],
      [2.0e-5, 0, 1.0e-5, 0, 3.0e-3, 0],
      [0, -2.0e-5, 0, 1.5e-5, 0, 3.0e-3],
    ];
    const C2 = Array.from({ length: 6 }, (_, i) => Array.from({ length: 21 }, (_, j) => ((i + 1) * (j % 5) - 2) * 1e-10));
    const config = parseReductionConfig({
      tunnel: { kind: 'open_jet', sectionArea: 6, pressureGradient: dpdx, openJet: eps },
      article: { referenceArea: S, referenceAreaKind: 'frontal', referenceLength: Lref, modelVolume: volume },
      balance: { centreOffset: offset, calibration: { linear: C1, interaction: C2 } },
      zeros: { bridges: bridgeZero },
      corrections: { horizontalBuoyancy: true },
      minimumSamplesPerPoint: 1,
    });
    // Mercker & Wickern, SAE 960671 (structure from memory): q_c = q_m(1 + ε_s + ε_n + ε_c)²;
    // C_Dc = C_Dm·q_m/q_c + ΔC_D,HB with the buoyancy drag ΔD_B = −(dp/dx)·V (Glauert 1933; BRP ch. 10).
    const ratio = (1 + eps.jetExpansion + eps.nozzleBlockage + eps.collectorBlockage) ** 2;
    const buoyancy = -dpdx * volume;
    const chosen = sweep(1200);
    const rows = chosen.map((c, index) => {
      const qm = c.q;
      const qc = qm * ratio;
      const drag = c.CD * qc * S + buoyancy;
      const body = windToBody(drag, c.CL * qc * S, c.CY * qc * S, c.pitchDeg * DEG, -c.yawDeg * DEG);
      const F = [body.A, body.Y, body.N];
      const loads = [...F, ...toBalanceCentre(F, [c.Cl * qc * S * Lref, c.Cm * qc * S * Lref, c.Cn * qc * S * Lref], offset)];
      // AIAA R-091-2003 / Ulbrich (NTRS 20120006665): R = C1·F + C2·H(F), H = squares then products i<j.
      const H = loads.map((f) => f * f);
      for (let i = 0; i < 6; i++) for (let j = i + 1; j < 6; j++) H.push(loads[i] * loads[j]);
      const bridges = C1.map((row, i) => row.reduce((s, v, j) => s + v * loads[j], 0) + C2[i].reduce((s, v, j) => s + v * H[j], 0) + bridgeZero[i]);
      return [index + 1, c.yawDeg, c.pitchDeg, qm / qFactor, 995.4, 23.8, 41, ...bridges];
    });
    const text = runFile(
      'time [s], point, yaw [deg], pitch [deg], dp_ref [Pa], p_baro [hPa], T_air [degC], RH [%], R1 [mV/V], R2 [mV/V], R3 [mV/V], R4 [mV/V], R5 [mV/V], R6 [mV/V]',
      ['# run: rt-open-jet (invented)', `# q_factor: ${qFactor}`],
      rows,
    );
    const result = await reduceRun([Buffer.from(text)], config, { fileName: 'rt-open.csv' });
    expectRecovered(result.points, chosen);
    result.points.forEach((p, i) => {
      expect(rel(p.uncorrectedDynamicPressure, chosen[i].q)).toBeLessThan(1e-9);
      expect(rel(p.corrections.dynamicPressureRatio, ratio)).toBeLessThan(1e-12);
      expect(p.corrections.solidBlockageMethod).toBe('open-jet-constants');
    });
    expect(result.dynamicPressureFactor).toBe(qFactor);
  });
});
