import { describe, expect, it } from 'vitest';
import {
  conductivityIapws2011_W_mK,
  saturationPressureIf97_Pa,
  viscosityIapws2008_Pa_s,
  waterPropertiesIapwsInto,
  waterStateIf97Region1,
} from '@/lib/engine/properties/water-iapws';
import { expectAbs, expectRel } from '@/tests/lib/engine/expect-close';

describe('IF97 region 1 (source: IAPWS-IF97 verification table for region 1, ENGINEERING.md W1–W3)', () => {
  const cases = [
    { id: 'W1', T: 300, p: 3e6, v: 1.00215168e-3, h: 115.331273, u: 112.324818, s: 0.392294792, cp: 4.17301218, w: 1507.73921 },
    { id: 'W2', T: 300, p: 80e6, v: 9.71180894e-4, h: 184.142828, u: 106.448356, s: 0.368563852, cp: 4.01008987, w: 1634.69054 },
    { id: 'W3', T: 500, p: 3e6, v: 1.202418e-3, h: 975.542239, u: 971.934985, s: 2.58041912, cp: 4.65580682, w: 1240.71337 },
  ];
  for (const c of cases) {
    it(`${c.id}: T ${c.T} K, p ${c.p / 1e6} MPa`, () => {
      const st = waterStateIf97Region1(c.T, c.p);
      expectRel(st.specificVolume_m3_kg, c.v, 1e-8, 'v');
      expectRel(st.enthalpy_J_kg / 1e3, c.h, 1e-8, 'h');
      expectRel(st.internalEnergy_J_kg / 1e3, c.u, 1e-8, 'u');
      expectRel(st.entropy_J_kgK / 1e3, c.s, 1e-8, 's');
      expectRel(st.isobaricHeatCapacity_J_kgK / 1e3, c.cp, 1e-8, 'cp');
      expectRel(st.speedOfSound_m_s, c.w, 1e-8, 'w');
    });
  }

  it('refuses impossible states', () => {
    expect(() => waterStateIf97Region1(250, 1e6)).toThrow(RangeError);
    expect(() => waterStateIf97Region1(400, 0.1e6)).toThrow(/saturation pressure/); // steam at 1 bar, 127 °C
    expect(() => waterStateIf97Region1(300, -1)).toThrow(RangeError);
  });
});

describe('IF97 saturation pressure eq. 30 (source: IF97 eq. 30 verification values, ENGINEERING.md W4)', () => {
  it('W4: 300, 500, 600 K', () => {
    expectRel(saturationPressureIf97_Pa(300) / 1e6, 3.53658941e-3, 1e-8, '300 K');
    expectRel(saturationPressureIf97_Pa(500) / 1e6, 2.63889776, 1e-8, '500 K');
    expectRel(saturationPressureIf97_Pa(600) / 1e6, 12.3443146, 1e-8, '600 K');
  });
});

describe('IAPWS 2008 viscosity (source: IAPWS 2008 release verification table, mu2 = 1, ENGINEERING.md W5)', () => {
  const points: [number, number, number][] = [
    [298.15, 998, 889.7351],
    [298.15, 1200, 1437.649467],
    [373.15, 1000, 307.883622],
    [433.15, 1, 14.538324],
    [433.15, 1000, 217.685358],
    [873.15, 1, 32.619287],
    [873.15, 100, 35.802262],
    [873.15, 600, 77.430195],
    [1173.15, 1, 44.217245],
    [1173.15, 100, 47.640433],
    [1173.15, 400, 64.154608],
  ];
  it.each(points)('W5: T %f K, rho %f kg/m3', (T, rho, expected) => {
    // The table prints six decimals: agree to half a unit in the last printed digit (≤ 3.4e-8 relative).
    expectAbs(viscosityIapws2008_Pa_s(T, rho) * 1e6, expected, 5e-7, 'mu');
  });
});

describe('IAPWS 2011 conductivity (source: IAPWS 2011 release verification table with lambda2 = 0, ENGINEERING.md W6)', () => {
  const points: [number, number, number][] = [
    [298.15, 0, 18.4341883],
    [298.15, 998, 607.712868],
    [298.15, 1200, 799.038144],
    [873.15, 0, 79.1034659],
  ];
  it.each(points)('W6: T %f K, rho %f kg/m3', (T, rho, expected) => {
    expectRel(conductivityIapws2011_W_mK(T, rho) * 1e3, expected, 1e-8, 'lambda');
  });
});

describe('liquid water set (source: [C] computed from the formulas in ENGINEERING.md section 3.1, checks W7–W12)', () => {
  const cases = [
    { id: 'W7', t: 7, p: 0.3e6, rho: 1000.00052, cp: 4199.863, mu: 1.426806e-3, k: 0.572449 },
    { id: 'W8', t: 12, p: 0.3e6, rho: 999.59302, cp: 4191.882, mu: 1.233897e-3, k: 0.583018 },
    { id: 'W9', t: 45, p: 0.3e6, rho: 990.30983, cp: 4178.295, mu: 5.958069e-4, k: 0.6349 },
    { id: 'W10', t: 60, p: 0.3e6, rho: 983.29721, cp: 4182.321, mu: 4.660908e-4, k: 0.651121 },
    { id: 'W11', t: 82, p: 0.3e6, rho: 970.63482, cp: 4196.813, mu: 3.454532e-4, k: 0.668388 },
    { id: 'W12', t: 20, p: 0.101325e6, rho: 998.20609, cp: 4184.794, mu: 1.001597e-3, k: 0.598011 },
  ];
  for (const c of cases) {
    it(`${c.id}: ${c.t} °C`, () => {
      const out = waterPropertiesIapwsInto(c.t + 273.15, c.p, { density_kg_m3: 0, specificHeat_J_kgK: 0, viscosity_Pa_s: 0, conductivity_W_mK: 0 });
      expectRel(out.density_kg_m3, c.rho, 1e-5, 'rho');
      expectRel(out.specificHeat_J_kgK, c.cp, 1e-5, 'cp');
      expectRel(out.viscosity_Pa_s, c.mu, 1e-5, 'mu');
      expectRel(out.conductivity_W_mK, c.k, 1e-5, 'k');
    });
  }
});
