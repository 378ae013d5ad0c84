import { describe, expect, it } from "vitest";
import { celsiusToFahrenheit, fahrenheitToCelsius, formatWeight, GRAMS_PER_OUNCE, GRAMS_PER_POUND, toCelsius, toGrams } from "@/lib/units/rules";

// Source of the factors: NIST Special Publication 811 (2008 edition), Guide for the Use of the
// International System of Units, Appendix B.8 (mass: ounce avoirdupois = 2.834 952 3125 E−02 kg,
// pound avoirdupois = 4.535 9237 E−01 kg, both exact) and B.9 (t/°C = (t/°F − 32)/1.8).
describe("mass conversion to grams (NIST SP 811, B.8)", () => {
  it("uses the exact avoirdupois factors", () => {
    expect(GRAMS_PER_OUNCE).toBe(28.349523125);
    expect(GRAMS_PER_POUND).toBe(453.59237);
    expect(GRAMS_PER_POUND / GRAMS_PER_OUNCE).toBeCloseTo(16, 12);
  });

  it("stores grams to 0.01 g", () => {
    expect(toGrams(16, "lb")).toBe(7257.48); // 7257.477 92 g
    expect(toGrams(248, "oz")).toBe(7030.68); // 15 lb 8 oz = 7030.681 735 g
    expect(toGrams(1, "oz")).toBe(28.35);
    expect(toGrams(7000.005, "g")).toBe(7000.01);
    expect(toGrams(6350.29, "g")).toBe(6350.29);
  });

  it("formats a weight in grams with pounds and ounces beside it", () => {
    expect(formatWeight(7257.48)).toBe("7257.48 g (16 lb 0.00 oz)");
  });
});

describe("temperature conversion (NIST SP 811, B.9)", () => {
  it("converts fixed points exactly", () => {
    expect(toCelsius(212, "F")).toBe(100);
    expect(toCelsius(32, "F")).toBe(0);
    expect(toCelsius(-40, "F")).toBe(-40);
    expect(toCelsius(98.6, "F")).toBe(37);
  });

  it("stores degrees Celsius to 0.01 °C", () => {
    expect(toCelsius(72, "F")).toBe(22.22); // 22.222… °C
    expect(toCelsius(80, "F")).toBe(26.67); // 26.666… °C
    expect(toCelsius(21.456, "C")).toBe(21.46);
  });

  it("round-trips through Fahrenheit", () => {
    for (const c of [-10, 0, 19.5, 22.25, 37]) expect(fahrenheitToCelsius(celsiusToFahrenheit(c))).toBeCloseTo(c, 12);
  });
});
