/**
 * The part of psychrolib 1.1.1 (ASHRAE Handbook 2017 psychrometrics, no bundled types) that the tests use.
 * It is one object whose methods use `this`, so call them on the object, never destructured.
 */
declare module 'psychrolib' {
  interface Psychrometrics {
    readonly SI: number;
    readonly IP: number;
    SetUnitSystem(unitSystem: number): void;
    /** Saturation vapour pressure, Pa in SI; dry-bulb temperature in °C. */
    GetSatVapPres(dryBulbTemperature: number): number;
    /** Humidity ratio, kg/kg in SI; temperature °C, relative humidity 0–1, pressure Pa. */
    GetHumRatioFromRelHum(dryBulbTemperature: number, relativeHumidity: number, pressure: number): number;
    /** Moist-air density, kg/m³ in SI; temperature °C, humidity ratio kg/kg, pressure Pa. */
    GetMoistAirDensity(dryBulbTemperature: number, humidityRatio: number, pressure: number): number;
  }
  const psychrolib: Psychrometrics;
  export default psychrolib;
}
