import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  buildCircuitPressureModel,
  circuitPressureDrop_Pa,
  solveCircuitHydraulics,
  type CircuitHydraulicSpec,
  type HydraulicPropertyProvider,
} from '@/lib/engine/hydraulics';
import { splitFlowBetweenCircuits } from '@/lib/engine/flow-split';
import { invertIncreasing } from '@/lib/engine/root-finding';

// Check F5/F6 inputs (ENGINEERING.md 4.4): water at 7 °C with fixed properties.
const water7: HydraulicPropertyProvider = () => ({ density_kg_m3: 1000.001, viscosity_Pa_s: 1.42681e-3 });
const Di = 0.01188;
const circuitSpec = (tubes: number, temperature = 7): CircuitHydraulicSpec => ({
  innerDiameter_m: Di,
  tubeLength_m: 1.2192,
  roughness_m: 1.5e-6,
  bendRadii_m: Array.from({ length: tubes - 1 }, () => 0.015875),
  tubeTemperatures_C: Array.from({ length: tubes }, () => temperature),
  bendTemperatures_C: Array.from({ length: tubes - 1 }, () => temperature),
  inletTemperature_C: temperature,
  outletTemperature_C: temperature,
});
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('root finding', () => {
  it('inverts an increasing function inside its bracket', () => {
    expect(invertIncreasing((x) => x * x, 2, 0, 2).x).toBeCloseTo(Math.SQRT2, 12);
  });
  it('refuses a target outside the bracket instead of looping', () => {
    expect(() => invertIncreasing((x) => x, 5, 0, 2)).toThrow(RangeError);
  });
  it('returns within the iteration cap for a nasty (step-like) function', () => {
    const r = invertIncreasing((x) => (x < 1 ? x * 1e-9 : 1 + x), 1.5, 0, 3, { maxIterations: 60 });
    expect(r.iterations).toBeLessThanOrEqual(60);
  });
});

describe('circuit pressure drop', () => {
  it('F6: single 6-tube circuit at 0.2 kg/s gives 33 843.8 Pa (ENGINEERING.md 4.4 check F6 [C])', () => {
    const model = buildCircuitPressureModel(circuitSpec(6), water7);
    expect(rel(circuitPressureDrop_Pa(model, 0.2), 33843.8)).toBeLessThan(1e-4);
    const r = solveCircuitHydraulics([circuitSpec(6)], [7], 0.2, water7);
    expect(rel(r.circuits[0].velocity_m_s, 1.8043)).toBeLessThan(1e-4);
    expect(rel(r.circuits[0].reynolds, 15023)).toBeLessThan(1e-4);
    expect(r.circuits[0].regime).toBe('turbulent');
  });

  it('F5: 8-pass and 6-pass circuits share 0.4 kg/s 46/54 % at 38 625.4 Pa (ENGINEERING.md 4.4 check F5 [C])', () => {
    const r = solveCircuitHydraulics([circuitSpec(8), circuitSpec(6)], [7, 7], 0.4, water7);
    expect(rel(r.pressureDrop_Pa, 38625.4)).toBeLessThan(1e-4);
    expect(rel(r.circuits[0].massFlow_kg_s, 0.18452)).toBeLessThan(1e-4);
    expect(rel(r.circuits[1].massFlow_kg_s, 0.21548)).toBeLessThan(1e-4);
    expect(rel(r.circuits[0].velocity_m_s, 1.6646)).toBeLessThan(1e-4);
    expect(rel(r.circuits[1].velocity_m_s, 1.944)).toBeLessThan(1e-4);
    expect(rel(r.circuits[0].reynolds, 13860)).toBeLessThan(1e-4);
    expect(rel(r.circuits[1].reynolds, 16186)).toBeLessThan(1e-4);
    expect(rel(r.maldistribution, 0.21548 / 0.2)).toBeLessThan(1e-4);
  });

  it('Ito bends give a different but close pressure drop and flag no range problem in turbulent flow', () => {
    const rennels = circuitPressureDrop_Pa(buildCircuitPressureModel(circuitSpec(6), water7, 'rennels'), 0.2);
    const itoModel = buildCircuitPressureModel(circuitSpec(6), water7, 'ito');
    const ito = circuitPressureDrop_Pa(itoModel, 0.2);
    expect(ito).not.toBe(rennels);
    expect(rel(ito, rennels)).toBeLessThan(0.05);
    expect(itoModel.itoOutOfRange).toBe(false);
  });

  it('reports the lowest Re along a circuit at its coldest (most viscous) point', () => {
    const viscous: HydraulicPropertyProvider = (t) => ({ density_kg_m3: 1000, viscosity_Pa_s: 1.4e-3 * (1 - 0.02 * (t - 7)) });
    const spec: CircuitHydraulicSpec = { ...circuitSpec(4), tubeTemperatures_C: [8, 10, 12, 14], bendTemperatures_C: [9, 11, 13], inletTemperature_C: 7, outletTemperature_C: 15 };
    const r = solveCircuitHydraulics([spec], [11], 0.05, viscous);
    expect(r.circuits[0].reynoldsMin).toBeCloseTo((4 * 0.05) / (Math.PI * Di * 1.4e-3), 6);
    expect(r.circuits[0].reynolds).toBeGreaterThan(r.circuits[0].reynoldsMin);
  });
});

describe('flow split properties (ENGINEERING.md 3.6)', () => {
  const arbCircuits = fc.array(fc.integer({ min: 1, max: 16 }), { minLength: 1, maxLength: 12 });
  const arbFlow = fc.double({ min: 0.005, max: 5, noNaN: true });

  it('flows sum to the total and all circuits share one ΔP to 1e-6', () => {
    fc.assert(
      fc.property(arbCircuits, arbFlow, (passes, total) => {
        const r = solveCircuitHydraulics(passes.map((p) => circuitSpec(p)), passes.map(() => 7), total, water7);
        const sum = r.circuits.reduce((a, c) => a + c.massFlow_kg_s, 0);
        expect(Math.abs(sum - total) / total).toBeLessThan(1e-12);
        for (const c of r.circuits) expect(rel(c.pressureDrop_Pa, r.pressureDrop_Pa)).toBeLessThan(1e-6);
        expect(r.converged).toBe(true);
      }),
      { numRuns: 60 },
    );
  });

  it('more total flow gives more ΔP and a higher velocity in every circuit', () => {
    fc.assert(
      fc.property(arbCircuits, arbFlow, fc.double({ min: 1.01, max: 3, noNaN: true }), (passes, total, factor) => {
        const specs = passes.map((p) => circuitSpec(p));
        const a = solveCircuitHydraulics(specs, passes.map(() => 7), total, water7);
        const b = solveCircuitHydraulics(specs, passes.map(() => 7), total * factor, water7);
        expect(b.pressureDrop_Pa).toBeGreaterThan(a.pressureDrop_Pa);
        a.circuits.forEach((c, i) => expect(b.circuits[i].velocity_m_s).toBeGreaterThan(c.velocity_m_s));
      }),
      { numRuns: 40 },
    );
  });

  it('identical circuits get identical flow', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 16 }), fc.integer({ min: 2, max: 40 }), arbFlow, (passes, count, total) => {
        const r = solveCircuitHydraulics(Array.from({ length: count }, () => circuitSpec(passes)), new Array(count).fill(7), total, water7);
        for (const c of r.circuits) expect(rel(c.massFlow_kg_s, total / count)).toBeLessThan(1e-12);
        expect(r.maldistribution).toBeCloseTo(1, 12);
      }),
      { numRuns: 40 },
    );
  });

  it('splits a power-law example exactly', () => {
    const r = splitFlowBetweenCircuits([(m) => m * m, (m) => 4 * m * m], 3);
    expect(r.massFlows_kg_s[0]).toBeCloseTo(2, 12);
    expect(r.massFlows_kg_s[1]).toBeCloseTo(1, 12);
    expect(r.pressureDrop_Pa).toBeCloseTo(4, 10);
  });

  it('refuses a pressure-drop function that does not rise with flow', () => {
    expect(() => splitFlowBetweenCircuits([() => 1, (m) => m], 1)).toThrow(RangeError);
  });
});
