import type { TunnelKind } from '@tunnelwright/contracts';
import { BaseModel } from '../base-model';

/**
 * A wind tunnel of the lab. Quantities are SI: width, height, length in m; area in m²;
 * speeds in m/s; pressureGradient (dp/dx) in Pa/m; shapeFactor (τ1) is dimensionless.
 */
export class Tunnel extends BaseModel {
  static override tableName = 'tunnels';

  name!: string;
  kind!: TunnelKind;
  description!: string;
  width!: number;
  height!: number;
  area!: number;
  length!: number;
  minSpeed!: number;
  maxSpeed!: number;
  pressureGradient!: number;
  shapeFactor!: number;
  openJetConstants!: Record<string, number>;
  capabilities!: { yawRange?: number; groundSimulation?: boolean; turbulenceIntensity?: number };
  archivedAt!: Date | null;

  static override get jsonAttributes(): string[] {
    return ['openJetConstants', 'capabilities'];
  }
}
