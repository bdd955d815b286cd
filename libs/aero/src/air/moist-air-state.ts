/** The measured state of the tunnel air, in SI units. */
export interface MoistAirState {
  /** Static (barometric) pressure, Pa. */
  readonly pressure: number;
  /** Thermodynamic temperature, K. */
  readonly temperature: number;
  /** Relative humidity as a fraction, 0–1 (0.5 = 50 %). */
  readonly relativeHumidity: number;
}

/** Moist-air state with the CO2 mole fraction that CIPM-2007 also uses. */
export interface CipmAirState extends MoistAirState {
  /** Mole fraction of carbon dioxide, 0–1; 0.0004 (400 µmol/mol) if not given. */
  readonly co2MoleFraction?: number;
}
