import type { UncertainValue } from '@tunnelwright/contracts';

const superscripts: Readonly<Record<string, string>> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

/** A quantity to three significant figures with its unit, switching to the kilo unit from 1000 up. */
function withKilo(value: number, unit: string): string {
  if (!Number.isFinite(value)) return '—';
  const kilo = Math.abs(value) >= 1000;
  const shown = kilo ? value / 1000 : value;
  return `${Number(shown.toPrecision(3)).toLocaleString('en-GB')} ${kilo ? 'k' : ''}${unit}`;
}

/** Power in W or kW, three significant figures: 523 W, 4.83 kW. */
export function powerText(watts: number | null): string {
  return watts === null ? '—' : withKilo(watts, 'W');
}

/** Force in N or kN, three significant figures. */
export function dragText(newtons: number | null): string {
  return newtons === null ? '—' : withKilo(newtons, 'N');
}

/** A Reynolds number as mantissa × 10 to a power: 1.75 × 10⁶. */
export function reynoldsText(reynoldsNumber: number | null): string {
  if (reynoldsNumber === null || !Number.isFinite(reynoldsNumber) || reynoldsNumber <= 0) return '—';
  const exponent = Math.floor(Math.log10(reynoldsNumber));
  let mantissa = Number((reynoldsNumber / 10 ** exponent).toFixed(2));
  let power = exponent;
  // Rounding can carry the mantissa to 10.00: show 1.00 × 10 to the next power instead.
  if (mantissa >= 10) [mantissa, power] = [mantissa / 10, power + 1];
  const raised = String(power)
    .split('')
    .map((c) => superscripts[c] ?? c)
    .join('');
  return `${mantissa.toFixed(2)} × 10${raised}`;
}

/** A coefficient with its expanded uncertainty, four decimals: 0.3123 ± 0.0041 (k = 2). */
export function coefficientText(value: UncertainValue | null): string {
  if (value === null) return '—';
  const shown = value.value.toFixed(4);
  return value.expandedUncertainty === null ? shown : `${shown} ± ${value.expandedUncertainty.toFixed(4)}`;
}

/** Plain words for a wind direction measured from the heading (0° head wind, 180° tail wind). */
export function windDirectionText(degrees: number): string {
  const folded = ((degrees % 360) + 360) % 360;
  const offNose = folded > 180 ? 360 - folded : folded;
  const shown = `${Number(folded.toFixed(1))}°`;
  if (offNose === 0) return 'Head wind';
  if (offNose === 180) return 'Tail wind';
  if (offNose === 90) return `Cross wind (${shown})`;
  return offNose < 90 ? `Quartering head wind (${shown})` : `Quartering tail wind (${shown})`;
}

/**
 * The full-scale air an estimate used, in words: "ISA sea-level air (1.225 kg/m³, 15 °C, 1013.25 hPa)" or
 * "dry air at 8.5 °C and 898.76 hPa (1.112 kg/m³)".
 */
export function airText(air: { density: number; temperature: number; pressure: number; standard: boolean }): string {
  const celsius = Number((air.temperature - 273.15).toFixed(2)).toLocaleString('en-GB');
  const hectopascals = Number((air.pressure / 100).toFixed(2)).toLocaleString('en-GB');
  const density = air.density.toFixed(3);
  return air.standard ? `ISA sea-level air (${density} kg/m³, ${celsius} °C, ${hectopascals} hPa)` : `dry air at ${celsius} °C and ${hectopascals} hPa (${density} kg/m³)`;
}
