/**
 * Writes the two invented example runs and their reduction configurations to libs/aero/examples/:
 * - closed-car-yaw-sweep: a 1:4 car model (invented "Vireo estate") on a turntable in a closed section,
 *   yaw sweep −10…+10 deg, loads in N and N·m, q measured directly.
 * - open-jet-bridges: a 40 % model (invented "Kestrel van") in a 3/4-open jet, bridge outputs R1…R6 in
 *   mV/V through a balance with interactions, q from the nozzle Δp_ref and a q factor.
 * The noise comes from a seeded generator, so the files are the same on every run.
 *
 * Run: node --import tsx scripts/make-example-runs.ts
 */
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const OUT = fileURLToPath(new URL('../libs/aero/examples/', import.meta.url));
const SAMPLES_PER_POINT = 120;
const SAMPLE_INTERVAL = 0.01;

/** Seeded uniform generator (mulberry32), so every run writes identical files. */
function random(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Zero-mean noise with the given standard deviation (sum of uniforms, near-normal). */
function noise(uniform: () => number, sd: number): number {
  let sum = 0;
  for (let i = 0; i < 12; i++) sum += uniform();
  return (sum - 6) * sd;
}

const fixed = (x: number, digits: number) => x.toFixed(digits);
const deg = Math.PI / 180;

interface Article { S: number; L: number }

/**
 * Body-axis loads [Fx, Fy, Fz, Mx, My, Mz] of an invented vehicle at yaw ψ (rad) and dynamic pressure q (Pa):
 * body-axis drag C_X = cx0 + 0.45ψ² (rising with yaw, as road vehicles do), side force 2.1ψ, lift 0.08 + 0.9ψ².
 */
function vehicleLoads(article: Article, psi: number, q: number, cx0: number): number[] {
  const qs = q * article.S;
  const qsl = qs * article.L;
  return [(cx0 + 0.45 * psi * psi) * qs, 2.1 * psi * qs, (0.08 + 0.9 * psi * psi) * qs, 0.35 * psi * qsl, -0.04 * qsl, 0.55 * psi * qsl];
}

function closedCarRun(): { csv: string; config: object } {
  const article = { S: 0.1375, L: 0.72 };
  const uniform = random(20240611);
  const tare = (psi: number) => [0.8 * Math.sin(psi), -1.1 * Math.sin(psi), -0.6, 0.05 * Math.sin(psi), 0.12, 0.02 * Math.sin(psi)];
  const zero = [0.42, -0.18, 1.35, 0.011, -0.023, 0.004];
  const lines = [
    '# run: 4107',
    '# tunnel: Hall B closed section (invented)',
    '# model: Vireo estate, 1:4 scale (invented)',
    '# operator: demo technician',
    'time [s], point, yaw [deg], pitch [deg], q [Pa], p_baro [hPa], T_air [degC], RH [%], Fx [N], Fy [N], Fz [N], Mx [N m], My [N m], Mz [N m]',
  ];
  const yaws = [-10, -6, -3, 0, 3, 6, 10];
  let t = 0;
  yaws.forEach((yawDeg, index) => {
    const psi = yawDeg * deg;
    for (let k = 0; k < SAMPLES_PER_POINT; k++) {
      const q = 1510 + noise(uniform, 3.5);
      const loads = vehicleLoads(article, psi, q, 0.315).map((f, i) => f + tare(psi)[i] + zero[i] + noise(uniform, i < 3 ? 0.35 : 0.02));
      lines.push(
        [fixed(t, 2), index + 1, fixed(yawDeg, 2), '0.00', fixed(q, 2), fixed(1008.6 + 0.01 * index, 2), fixed(21.3 + 0.02 * index, 2), fixed(48.5, 1), ...loads.map((f, i) => fixed(f, i < 3 ? 3 : 4))].join(', '),
      );
      t += SAMPLE_INTERVAL;
    }
  });
  const config = {
    tunnel: { name: 'Hall B closed section (invented)', kind: 'closed', sectionArea: 4.32, width: 2.4, height: 1.8, tunnelShapeFactor: 0.86, pressureGradient: -1.8 },
    article: {
      name: 'Vireo estate 1:4 (invented)',
      referenceArea: article.S,
      referenceAreaKind: 'frontal',
      referenceLength: article.L,
      modelVolume: 0.105,
      frontalArea: article.S,
      bodyShapeFactor: 0.96,
      momentReferenceCentre: [0, 0, 0],
      scale: 4,
    },
    balance: { capacities: [400, 400, 1200, 120, 200, 120], centreOffset: [0, 0, 0] },
    zeros: {
      loads: zero,
      tare: { yaw: [-12, 0, 12], pitch: [0], loads: [[tare(-12 * deg)], [tare(0)], [tare(12 * deg)]] },
    },
    corrections: { solidBlockage: 'thom', wakeBlockage: 'streamlined', horizontalBuoyancy: true },
    densityModel: 'cipm-2007',
    fullScale: { groundSpeed: 27.78, windSpeed: 3, windDirection: 30 },
    windAveraging: {},
    uncertainty: { loads: [0.4, 0.4, 1.0, 0.05, 0.08, 0.05], dynamicPressure: 1.5, barometricPressure: 20, temperature: 0.1, relativeHumidity: 0.02, referenceArea: 0.0005, referenceLength: 0.002 },
    minimumSamplesPerPoint: 100,
  };
  return { csv: lines.join('\n') + '\n', config };
}

/** Primary sensitivities C1 (mV/V per N or N·m) of the invented open-jet balance, with small cross-talk. */
const C1 = [
  [2.0e-3, 2.0e-5, -1.5e-5, 0, 1.0e-5, 0],
  [1.0e-5, 2.0e-3, 0, 2.0e-5, 0, -1.0e-5],
  [-1.0e-5, 0, 5.0e-4, 0, 5.0e-6, 0],
  [0, 3.0e-5, 0, 3.0e-3, 0, 2.0e-5],
  [2.0e-5, 0, 1.0e-5, 0, 3.0e-3, 0],
  [0, -2.0e-5, 0, 1.5e-5, 0, 3.0e-3],
];

/** Interaction matrix C2 (6×21, mV/V per load²) on [F1²…F6², F1F2 … F5F6]: a few small terms. */
function interactionMatrix(): number[][] {
  const c2 = Array.from({ length: 6 }, () => new Array<number>(21).fill(0));
  c2[0][2] = 2.0e-10; // Fx bridge sees Fz²
  c2[0][7] = -1.0e-9; // Fx bridge sees Fx·Fz (index 6 + 1: F1F3)
  c2[2][0] = 5.0e-10; // Fz bridge sees Fx²
  c2[4][2] = 3.0e-10; // My bridge sees Fz²
  c2[5][6] = 4.0e-9; // Mz bridge sees Fx·Fy
  return c2;
}

function bridgesFrom(loads: number[], c2: number[][]): number[] {
  const h: number[] = loads.map((f) => f * f);
  for (let i = 0; i < 5; i++) for (let j = i + 1; j < 6; j++) h.push(loads[i] * loads[j]);
  return C1.map((row, i) => row.reduce((sum, c, j) => sum + c * loads[j], 0) + c2[i].reduce((sum, c, j) => sum + c * h[j], 0));
}

function openJetRun(): { csv: string; config: object } {
  const article = { S: 0.352, L: 1.16 };
  const uniform = random(19960201);
  const qFactor = 1.0235;
  const c2 = interactionMatrix();
  const bridgeZero = [0.012, -0.008, 0.021, 0.003, -0.005, 0.002];
  const lines = [
    '# run: 5213',
    '# tunnel: Hall D open jet (invented)',
    '# model: Kestrel van, 40 % scale (invented)',
    `# q_factor: ${qFactor}`,
    'time [s], point, yaw [deg], pitch [deg], dp_ref [Pa], p_baro [hPa], T_air [degC], RH [%], R1 [mV/V], R2 [mV/V], R3 [mV/V], R4 [mV/V], R5 [mV/V], R6 [mV/V]',
  ];
  const yaws = [-10, -5, 0, 5, 10];
  let t = 0;
  yaws.forEach((yawDeg, index) => {
    const psi = yawDeg * deg;
    for (let k = 0; k < SAMPLES_PER_POINT; k++) {
      const dp = 1175 + noise(uniform, 2.5);
      const loads = vehicleLoads(article, psi, dp * qFactor, 0.38).map((f, i) => f + noise(uniform, i < 3 ? 0.5 : 0.03));
      const bridges = bridgesFrom(loads, c2).map((r, i) => r + bridgeZero[i] + noise(uniform, 2e-5));
      lines.push([fixed(t, 2), index + 1, fixed(yawDeg, 2), '0.00', fixed(dp, 2), fixed(995.4, 2), fixed(23.8 + 0.03 * index, 2), fixed(41.0, 1), ...bridges.map((r) => fixed(r, 6))].join(', '));
      t += SAMPLE_INTERVAL;
    }
  });
  const config = {
    tunnel: {
      name: 'Hall D open jet (invented)',
      kind: 'open_jet',
      sectionArea: 6.0,
      width: 2.8,
      height: 2.15,
      pressureGradient: -0.9,
      openJet: { jetExpansion: -0.0105, nozzleBlockage: 0.0042, collectorBlockage: 0.0018 },
    },
    article: { name: 'Kestrel van 40 % (invented)', referenceArea: article.S, referenceAreaKind: 'frontal', referenceLength: article.L, modelVolume: 0.46, scale: 2.5 },
    balance: {
      capacities: [600, 600, 2500, 250, 400, 250],
      calibration: { linear: C1, interaction: c2, tolerance: 1e-12, maxIterations: 50 },
      centreOffset: [0.05, 0, -0.12],
    },
    zeros: { bridges: bridgeZero },
    corrections: { horizontalBuoyancy: true },
    densityModel: 'cipm-2007',
    fullScale: { groundSpeed: 25, windSpeed: 0, windDirection: 0 },
    windAveraging: {},
    uncertainty: { loads: [0.5, 0.5, 1.5, 0.06, 0.1, 0.06], dynamicPressure: 1.2, barometricPressure: 20, temperature: 0.1, relativeHumidity: 0.02, referenceArea: 0.001, referenceLength: 0.003 },
    minimumSamplesPerPoint: 100,
  };
  return { csv: lines.join('\n') + '\n', config };
}

for (const [name, run] of [
  ['closed-car-yaw-sweep', closedCarRun()],
  ['open-jet-bridges', openJetRun()],
] as const) {
  writeFileSync(join(OUT, `${name}.csv`), run.csv);
  writeFileSync(join(OUT, `${name}.config.json`), `${JSON.stringify(run.config, null, 2)}\n`);
  console.log(`wrote ${join(OUT, name)}.csv and .config.json`);
}
