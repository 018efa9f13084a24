import { describe, expect, it } from 'vitest';
import {
  waterConductivityFit_W_mK,
  waterDensityFit_kg_m3,
  waterSpecificHeatFit_J_kgK,
  waterViscosityFit_Pa_s,
} from '@/lib/engine/properties/water-fallback-fits';
import { fluidProperties } from '@/lib/engine/properties/fluid';
import { expectRel } from '@/tests/lib/engine/expect-close';

const WATER = { kind: 'water', glycolMassFraction: 0 } as const;

describe('water fallback fits (source: computed from the formulas in ENGINEERING.md section 3.1, check W13)', () => {
  it('W13: at 7 °C within 6e−5 (ρ), 2.4e−4 (c_p), 4.8e−4 (k), 6.4e−4 (μ) of W7', () => {
    // W7 values: ENGINEERING.md 4.1, computed from the IAPWS formulas of section 3.1 [C].
    expectRel(waterDensityFit_kg_m3(7), 1000.00052, 6e-5, 'ρ');
    expectRel(waterSpecificHeatFit_J_kgK(7), 4199.863, 2.4e-4, 'c_p');
    expectRel(waterConductivityFit_W_mK(7), 0.572449, 4.8e-4, 'k');
    expectRel(waterViscosityFit_Pa_s(7), 1.426806e-3, 6.4e-4, 'μ');
  });

  it('max relative error against IAPWS over 0.01–100 °C every 1 K stays within the table of ENGINEERING.md 3.1', () => {
    // The table prints the maxima to two significant figures; the bound is the printed value plus half a unit of
    // its last digit (e.g. c_p: 2.43e−4 at 0.01 °C prints as 2.4e−4). 0 °C is replaced by 0.01 °C, the fits' lower
    // bound (IAPWS itself accepts 0 °C; the fits refuse it by design).
    const bounds = { density: 5.75e-5, specificHeat: 2.45e-4, conductivity: 4.85e-4, viscosity: 6.45e-4 };
    const max = { density: 0, specificHeat: 0, conductivity: 0, viscosity: 0 };
    const temperatures = [0.01, ...Array.from({ length: 100 }, (_, i) => i + 1)];
    for (const t of temperatures) {
      const ref = fluidProperties(WATER, t);
      max.density = Math.max(max.density, Math.abs(waterDensityFit_kg_m3(t) / ref.density_kg_m3 - 1));
      max.specificHeat = Math.max(max.specificHeat, Math.abs(waterSpecificHeatFit_J_kgK(t) / ref.specificHeat_J_kgK - 1));
      max.conductivity = Math.max(max.conductivity, Math.abs(waterConductivityFit_W_mK(t) / ref.conductivity_W_mK - 1));
      max.viscosity = Math.max(max.viscosity, Math.abs(waterViscosityFit_Pa_s(t) / ref.viscosity_Pa_s - 1));
    }
    expect(max.density).toBeLessThanOrEqual(bounds.density);
    expect(max.specificHeat).toBeLessThanOrEqual(bounds.specificHeat);
    expect(max.conductivity).toBeLessThanOrEqual(bounds.conductivity);
    expect(max.viscosity).toBeLessThanOrEqual(bounds.viscosity);
    // The fits are not trivially loose: each reaches at least half of its stated maximum somewhere.
    expect(max.density).toBeGreaterThan(bounds.density / 2);
    expect(max.specificHeat).toBeGreaterThan(bounds.specificHeat / 2);
    expect(max.conductivity).toBeGreaterThan(bounds.conductivity / 2);
    expect(max.viscosity).toBeGreaterThan(bounds.viscosity / 2);
  });

  it('refuses temperatures outside 0.01–100 °C', () => {
    for (const fit of [waterDensityFit_kg_m3, waterSpecificHeatFit_J_kgK, waterConductivityFit_W_mK, waterViscosityFit_Pa_s]) {
      expect(() => fit(0)).toThrow(RangeError);
      expect(() => fit(100.5)).toThrow(RangeError);
      expect(() => fit(Number.NaN)).toThrow(RangeError);
      expect(fit(100)).toBeGreaterThan(0);
    }
  });
});
