import { signed } from "../numbers";
// Unit conversions for what technicians type in. Factors: NIST SP 811 (2008), Appendix B.
// Stored precision: grams to 0.01 g, degrees Celsius to 0.01 °C.

export const GRAMS_PER_OUNCE = 28.349523125; // avoirdupois ounce, exact (NIST SP 811 B.8)
export const GRAMS_PER_POUND = 453.59237; // avoirdupois pound, exact (NIST SP 811 B.8)

export type MassUnit = "g" | "oz" | "lb";
export type TemperatureUnit = "C" | "F";

export const roundTo = (value: number, decimals: number): number => {
  const f = 10 ** decimals;
  // Scaling by 1 + ε keeps values such as 1.005 from rounding down through binary representation.
  return Math.round(value * f * (1 + Number.EPSILON)) / f;
};

/** t/°C = (t/°F − 32)/1.8 (NIST SP 811 B.9, temperature). */
export function fahrenheitToCelsius(f: number): number {
  return (f - 32) / 1.8;
}

export function celsiusToFahrenheit(c: number): number {
  return c * 1.8 + 32;
}

export function toGrams(value: number, unit: MassUnit): number {
  const g = unit === "g" ? value : unit === "oz" ? value * GRAMS_PER_OUNCE : value * GRAMS_PER_POUND;
  return roundTo(g, 2);
}

export function toCelsius(value: number, unit: TemperatureUnit): number {
  return roundTo(unit === "C" ? value : fahrenheitToCelsius(value), 2);
}

/** A weight for people: grams with the pounds-and-ounces reading beside it. */
export function formatWeight(grams: number): string {
  const totalOz = grams / GRAMS_PER_OUNCE;
  const lb = Math.floor(totalOz / 16);
  const oz = totalOz - lb * 16;
  return `${grams.toFixed(2)} g (${lb} lb ${oz.toFixed(2)} oz)`;
}

export function formatTemperature(c: number): string {
  return `${signed(c, 1)} °C (${signed(celsiusToFahrenheit(c), 1)} °F)`;
}
