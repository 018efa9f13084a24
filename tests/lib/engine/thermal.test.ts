import { describe, expect, it } from 'vitest';
import { buildSweepNetwork, createSweepState, mixedLeavingAir, runSweeps, type SaturationCurve } from '@/lib/engine/thermal-sweep';
import { tabulatedSaturationCurve } from '@/lib/engine/saturation-table';
import { saturationEnthalpy_J_kg, saturationTemperatureFromEnthalpy_C, saturationVapourPressure_Pa } from '@/lib/engine/psychrometrics';
import { solveCoilThermal } from '@/lib/engine/thermal';
import { wetSegmentBraunKleinMitchell1989 } from '@/lib/engine/wet-coil';
import { traceCircuits } from '@/lib/engine/topology';
import { deriveGeometry } from '@/lib/engine/geometry';
import { serpentineCircuiting } from '@/lib/engine/generators';
import type { CoilDocument, Geometry } from '@/lib/engine/types';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/**
 * An N-row serpentine with constant conductance, air capacity rate 1 W/K, run through the segment sweep:
 * returns the air-side effectiveness P_air = (t_a,out − t_a,in)/(t_w,in − t_a,in) with t_a,in 0, t_w,in 1.
 */
function constantUSerpentine(rows: number, R: number, ntu: number, segments: number, direction: 'counter' | 'co' = 'counter', tubesHigh = 1, airMixing: 'strip' | 'staggered' = 'strip'): number {
  const circuits = Array.from({ length: tubesHigh }, (_, k) => ({
    tubes: Array.from({ length: rows }, (_, i) => (direction === 'counter' ? rows - 1 - i : i) * tubesHigh + k),
    firstEntersAtConnection: true,
  }));
  const network = buildSweepNetwork(rows, tubesHigh, segments, circuits, airMixing);
  const state = createSweepState(network);
  const n = rows * tubesHigh;
  const ua = new Float64Array(n).fill(ntu / (rows * tubesHigh * segments));
  const out = runSweeps(
    network,
    {
      airInletDryBulb_C: 0,
      airInletHumidityRatio: 0,
      airMassFlowDry_kg_s: 1 / 1006, // C_air = 1 W/K with c_pm = 1006 at W = 0
      uaAirDry: ua,
      uaAirWet: ua,
      uaWater: new Float64Array(n).fill(Infinity),
      cpWater: new Float64Array(n).fill(1 / R / tubesHigh),
      circuitMassFlow: new Float64Array(tubesHigh).fill(1),
      waterInlet_C: 1,
    },
    state,
    { tolerance_K: 1e-13, maxSweeps: 2000 },
  );
  expect(out.converged).toBe(true);
  return mixedLeavingAir(network, state).dryBulb_C;
}

describe('segment sweep with constant conductance (ENGINEERING.md 4.7)', () => {
  it('N6: 2-row counter-cross serpentine, R 0.5, NTU 2 → 0.7523072856 within 0.1 % at 5 segments (Nicole form in `ht` [S], confirmed by simulation [C])', () => {
    expect(rel(constantUSerpentine(2, 0.5, 2, 5), 0.7523072856)).toBeLessThan(1e-3);
  });
  it('N7: 3 rows → 0.7646062269 within 0.1 % ([C] closed form = simulation)', () => {
    expect(rel(constantUSerpentine(3, 0.5, 2, 5), 0.7646062269)).toBeLessThan(1e-3);
  });
  it('N8: 4 rows (corrected ξ) → 0.7688870556 and R 1, NTU 4 → 0.7760371188 within 0.1 % ([C] sympy derivation = simulation)', () => {
    expect(rel(constantUSerpentine(4, 0.5, 2, 5), 0.7688870556)).toBeLessThan(1e-3);
    expect(rel(constantUSerpentine(4, 1, 4, 5), 0.7760371188)).toBeLessThan(1e-3);
  });
  it('N9: 5 rows → 0.7709475852 and R 1, NTU 4 → 0.7841072516 within 0.1 % (Nicole form [S] confirmed by simulation [C])', () => {
    expect(rel(constantUSerpentine(5, 0.5, 2, 5), 0.7709475852)).toBeLessThan(1e-3);
    expect(rel(constantUSerpentine(5, 1, 4, 5), 0.7841072516)).toBeLessThan(1e-3);
  });
  it('N10: 1–5 rows at R 0.25, NTU 1.5 within 0.1 % ([C])', () => {
    const expected = [0.7060847555, 0.7273365344, 0.7316342115, 0.733097264, 0.7337873099];
    expected.forEach((p, i) => expect(rel(constantUSerpentine(i + 1, 0.25, 1.5, 5), p)).toBeLessThan(1e-3));
  });
  it('N13: the segment model reproduces 0.769177 / 0.768960 / 0.768899 at 1 / 2 / 5 segments per tube to 1e-6 ([C] segment formula of 3.10 with strip air)', () => {
    expect(rel(constantUSerpentine(4, 0.5, 2, 1), 0.769177)).toBeLessThan(1e-6);
    expect(rel(constantUSerpentine(4, 0.5, 2, 2), 0.76896)).toBeLessThan(1e-6);
    expect(rel(constantUSerpentine(4, 0.5, 2, 5), 0.768899)).toBeLessThan(1e-6);
  });
  it('N12: co-current (water enters the air-inlet row) 2 and 4 rows → 0.640901 and 0.635518 at 400 segments ([C] fine-grid simulation)', () => {
    expect(rel(constantUSerpentine(2, 0.5, 2, 400, 'co'), 0.640901)).toBeLessThan(1e-5);
    expect(rel(constantUSerpentine(4, 0.5, 2, 400, 'co'), 0.635518)).toBeLessThan(1e-5);
  });
  it('several tube levels with uniform circuiting give the single-level answer with strip air', () => {
    const one = constantUSerpentine(4, 0.5, 2, 5);
    expect(rel(constantUSerpentine(4, 0.5, 2, 5, 'counter', 5), one)).toBeLessThan(1e-12);
  });
  it('staggered mixing differs from strips only through the edge tubes: the gap shrinks as tubes high grows', () => {
    const one = constantUSerpentine(4, 0.5, 2, 5);
    const gap5 = rel(constantUSerpentine(4, 0.5, 2, 5, 'counter', 5, 'staggered'), one);
    const gap24 = rel(constantUSerpentine(4, 0.5, 2, 5, 'counter', 24, 'staggered'), one);
    expect(gap24).toBeLessThan(gap5);
    expect(gap24).toBeLessThan(2.5e-3);
  });
});

describe('tabulated saturation curve', () => {
  const p = 101325;
  const curve = tabulatedSaturationCurve(p, 2, 30);
  it('matches the ASHRAE functions of psychrometrics.ts to 1e-8 over the table', () => {
    for (let t = 1.03; t < 31; t += 0.37) {
      expect(rel(curve.enthalpy_J_kg(t), saturationEnthalpy_J_kg(t, p))).toBeLessThan(1e-8);
      const pw = saturationVapourPressure_Pa(t);
      expect(rel(curve.humidityRatio(t), (0.621945 * pw) / (p - pw))).toBeLessThan(1e-8);
      const h = saturationEnthalpy_J_kg(t, p);
      expect(curve.temperatureFromEnthalpy_C(h)).toBeCloseTo(t, 6);
      expect(curve.temperatureFromEnthalpy_C(h, t + 0.7)).toBeCloseTo(t, 6);
    }
  });
  it('falls back to the direct functions outside the table', () => {
    const h = saturationEnthalpy_J_kg(45, p);
    expect(curve.enthalpy_J_kg(45)).toBe(h);
    expect(curve.temperatureFromEnthalpy_C(h)).toBeCloseTo(saturationTemperatureFromEnthalpy_C(h, p), 9);
  });
});

describe('wet segments (ENGINEERING.md 4.8 check K4)', () => {
  // K1 inputs: ṁ_a 1.0 kg/s dry air, 27 °C, W 0.0112, 101 325 Pa; ṁ_w 1.2 kg/s, c_pw 4200, 7 °C; UA_a 3000, UA_w 17 500 W/K.
  function wetSerpentine(rows: number, curve: SaturationCurve) {
    const segments = 10;
    const network = buildSweepNetwork(rows, 1, segments, [{ tubes: Array.from({ length: rows }, (_, i) => rows - 1 - i), firstEntersAtConnection: true }]);
    const state = createSweepState(network);
    const uaA = new Float64Array(rows).fill(3000 / (rows * segments));
    runSweeps(
      network,
      {
        airInletDryBulb_C: 27,
        airInletHumidityRatio: 0.0112,
        airMassFlowDry_kg_s: 1,
        uaAirDry: uaA,
        uaAirWet: uaA,
        uaWater: new Float64Array(rows).fill(17500 / (rows * segments)),
        cpWater: new Float64Array(rows).fill(4200),
        circuitMassFlow: Float64Array.of(1.2),
        waterInlet_C: 7,
        airInletDewPoint_C: 15.774,
        saturation: curve,
      },
      state,
      { tolerance_K: 1e-10 },
    );
    const q = 1.2 * 4200 * (state.circuitWaterOut[0] - 7);
    const wetCount = state.wet.reduce((a, b) => a + b, 0);
    const leaving = mixedLeavingAir(network, state);
    const airQ = 1 * ((1006 * 27 + 0.0112 * (2501000 + 1860 * 27)) - leaving.enthalpy_J_kg);
    return { q, tOut: state.circuitWaterOut[0], wetCount, airQ, total: rows * segments };
  }
  const curve = tabulatedSaturationCurve(101325, 5, 29);
  it('one wet segment of the sweep equals wetSegmentBraunKleinMitchell1989 (same BKM segment equations, 3.11)', () => {
    const network = buildSweepNetwork(1, 1, 1, [{ tubes: [0], firstEntersAtConnection: true }]);
    const state = createSweepState(network);
    runSweeps(
      network,
      {
        airInletDryBulb_C: 27,
        airInletHumidityRatio: 0.0112,
        airMassFlowDry_kg_s: 0.01,
        uaAirDry: Float64Array.of(30),
        uaAirWet: Float64Array.of(30),
        uaWater: Float64Array.of(175),
        cpWater: Float64Array.of(4200),
        circuitMassFlow: Float64Array.of(0.05),
        waterInlet_C: 7,
        airInletDewPoint_C: 15.774,
        saturation: curve,
      },
      state,
      { tolerance_K: 1e-11 },
    );
    const reference = wetSegmentBraunKleinMitchell1989({
      uaAir_W_K: 30,
      uaWater_W_K: 175,
      airMassFlowDry_kg_s: 0.01,
      airInletEnthalpy_J_kg: 1006 * 27 + 0.0112 * (2501000 + 1860 * 27),
      airInletTemperature_C: 27,
      waterInletTemperature_C: 7,
      waterCapacityRate_W_K: 210,
      pressure_Pa: 101325,
    });
    expect(state.wet[0]).toBe(1);
    expect(rel(-state.heatToAir[0], reference.heat_W)).toBeLessThan(1e-6);
    expect(state.tubeWaterOut[0]).toBeCloseTo(reference.waterOutletTemperature_C, 6);
    expect(state.airOutT[0]).toBeCloseTo(reference.airOutletTemperature_C, 5);
    expect(rel(state.airOutW[0], reference.airOutletHumidityRatio)).toBeLessThan(1e-5);
  });
  it('K4: 2-row wet serpentine, 10 segments per tube → 25 938 W, t_w,out 12.146 °C (tol 2e-3; [C] segment model)', () => {
    const r = wetSerpentine(2, curve);
    expect(r.wetCount).toBe(r.total);
    expect(rel(r.q, 25938)).toBeLessThan(2e-3);
    expect(rel(r.tOut, 12.146)).toBeLessThan(2e-3);
    expect(rel(r.airQ, r.q)).toBeLessThan(1e-8);
  });
  it('K4: 4-row → 26 510 W, t_w,out 12.260 °C (tol 2e-3; [C] segment model)', () => {
    const r = wetSerpentine(4, curve);
    expect(r.wetCount).toBe(r.total);
    expect(rel(r.q, 26510)).toBeLessThan(2e-3);
    expect(rel(r.tOut, 12.26)).toBeLessThan(2e-3);
  });
});

const referenceGeometry = (rows: number): Geometry => ({
  rows,
  tubesPerRow: 24,
  layout: 'staggered',
  tubeOuterDiameter_m: 0.0127,
  tubeWall_m: 0.00041,
  transversePitch_m: 0.03175,
  rowPitch_m: 0.0275,
  finnedLength_m: 1.2192,
  fin: { type: 'plain', thickness_m: 0.00015, pitch_m: 0.00254, conductivity_W_mK: 200 },
  tubeConductivity_W_mK: 390,
});

describe('E1 end to end: 2-row hot-water heating coil (ENGINEERING.md 4.8 check E1 [C], tol 5e-4)', () => {
  const geometry = referenceGeometry(2);
  const doc: CoilDocument = {
    schemaVersion: 1,
    name: 'E1 check',
    geometry,
    circuiting: serpentineCircuiting(geometry, 24),
    conditions: {
      air: { faceVelocity_m_s: 2.5, inletDryBulb_C: 10, inletRelativeHumidity: 0, altitude_m: 0 },
      fluid: { kind: 'water', glycolMassFraction: 0, inletTemperature_C: 80, massFlow_kg_s: 1 },
      minimumFlowFraction: 0.5,
      minimumAirTemperature_C: null,
    },
  };
  // Properties fixed as E1 states: water at 75 °C / 0.3 MPa, air at 20 °C.
  const water = { density_kg_m3: 974.945, specificHeat_J_kgK: 4191.1, viscosity_Pa_s: 3.7748e-4, conductivity_W_mK: 0.6637, prandtl: (4191.1 * 3.7748e-4) / 0.6637 };
  const air = { density_kg_m3: 1.2046, viscosity_Pa_s: 1.8206e-5, specificHeat_J_kgK: 1006.14, prandtl: 0.708 };
  const topology = traceCircuits(doc);
  const r = solveCoilThermal(doc, deriveGeometry(geometry), topology.circuits, { fluid: () => water, fixedAir: air }, { segmentsPerTube: 6, airMixing: 'strip', bendMethod: 'rennels' });

  it('is a counterflow full serpentine of 24 two-pass circuits', () => {
    expect(topology.valid).toBe(true);
    expect(topology.circuits).toHaveLength(24);
    expect(topology.circuits.every((c) => c.passes === 2 && c.arrangement === 'counterflow')).toBe(true);
  });
  it('air mass flow 2.79778 kg/s, capacity 71 365 W, leaving air 35.352 °C, leaving water 62.972 °C', () => {
    expect(rel(r.airMassFlow_kg_s, 2.79778)).toBeLessThan(5e-4);
    expect(rel(r.capacity_W, 71365)).toBeLessThan(5e-4);
    expect(rel(r.leavingAirDryBulb_C, 35.352)).toBeLessThan(5e-4);
    expect(rel(r.leavingWaterTemperature_C, 62.972)).toBeLessThan(5e-4);
    expect(r.mode).toBe('heating');
    expect(r.condensate_kg_s).toBe(0);
  });
  it('water pressure drop per circuit 583.3 Pa, air pressure drop 27.54 Pa', () => {
    expect(rel(r.hydraulics.pressureDrop_Pa, 583.3)).toBeLessThan(5e-4);
    expect(rel(r.airPressureDrop_Pa, 27.54)).toBeLessThan(5e-4);
    expect(r.airPressureDropIsWetEstimate).toBe(false);
  });
  it('water velocity 0.38555 m/s and Re 11 830 per circuit; energy balance to 1e-6; converged', () => {
    expect(rel(r.hydraulics.circuits[0].velocity_m_s, 0.38555)).toBeLessThan(5e-4);
    expect(rel(r.hydraulics.circuits[0].reynolds, 11830)).toBeLessThan(5e-4);
    expect(r.energyBalanceError).toBeLessThan(1e-6);
    expect(r.converged).toBe(true);
  });
});
