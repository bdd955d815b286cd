import type { ServiceInput, TunnelInput } from '@tunnelwright/contracts';

/** The demo lab's two tunnels. All quantities SI (m, m², m/s, Pa/m). */
export const demoTunnels: TunnelInput[] = [
  {
    name: 'Tunnel 1 — closed section',
    kind: 'closed',
    description: 'Low-speed closed-return tunnel with a 2.0 × 1.5 m closed test section and corner fillets. Turntable balance for models up to about 8 % blockage.',
    width: 2.0,
    height: 1.5,
    // 3.0 m² less four corner fillets.
    area: 2.9,
    length: 4.5,
    minSpeed: 5,
    maxSpeed: 55,
    pressureGradient: -0.6,
    shapeFactor: 0.86,
    openJetConstants: {},
    capabilities: { yawRange: 360, groundSimulation: false, turbulenceIntensity: 0.002 },
  },
  {
    name: 'Tunnel 2 — open jet',
    kind: 'open_jet',
    description: 'Open-jet hall with a 2.6 × 2.2 m nozzle and a collector 7 m downstream, for building, bridge-section and vehicle models.',
    width: 2.6,
    height: 2.2,
    area: 5.5,
    length: 7.0,
    minSpeed: 3,
    maxSpeed: 40,
    pressureGradient: 0,
    shapeFactor: 0.86,
    openJetConstants: { nozzleBlockageFactor: -0.25, jetExpansionFactor: 0.12, collectorBlockageFactor: 0.01 },
    capabilities: { yawRange: 180, groundSimulation: true, turbulenceIntensity: 0.004 },
  },
];

/** Services with rates in pence (GBP minor units). `tunnel` names a tunnel above, or null for any. */
export const demoServices: (Omit<ServiceInput, 'tunnelId'> & { tunnel: string | null })[] = [
  { name: 'Half-day tunnel block', description: 'Four hours of tunnel time with a technician.', unit: 'half_day', rate: 145000, currency: 'GBP', tunnel: null },
  { name: 'Full-day tunnel block', description: 'Eight hours of tunnel time with a technician.', unit: 'day', rate: 265000, currency: 'GBP', tunnel: null },
  { name: 'Model set-up', description: 'Mounting, levelling and balance check of a new model.', unit: 'item', rate: 60000, currency: 'GBP', tunnel: null },
  { name: 'Model change', description: 'Swapping a configuration between runs.', unit: 'item', rate: 35000, currency: 'GBP', tunnel: null },
  { name: 'Data-only re-analysis', description: 'Re-reducing earlier runs with new corrections or reference dimensions; no tunnel time.', unit: 'hour', rate: 9500, currency: 'GBP', tunnel: null },
];
