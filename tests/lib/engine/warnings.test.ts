import { describe, expect, it } from 'vitest';
import {
  energyBalanceWarnings,
  erosionVelocityLimit_m_s,
  freezeWarnings,
  partLoadWarnings,
  pressureDropWarnings,
  regimeWarnings,
  solverDefectWarnings,
  velocityWarnings,
  wetFaceVelocityWarnings,
  type CircuitFlowFacts,
} from '@/lib/engine/warnings';

const fact = (index: number, over: Partial<CircuitFlowFacts> = {}): CircuitFlowFacts => ({
  index,
  velocity_m_s: 1,
  velocityMax_m_s: 1,
  reynoldsMin: 10000,
  regime: 'turbulent',
  maxTemperature_C: 12,
  runsDownward: false,
  ...over,
});

describe('design warnings (ENGINEERING.md 2.4–2.6)', () => {
  it('laminar at design is critical, transitional a warning; the minimum flow adds only new circuits', () => {
    const w = regimeWarnings([fact(1, { regime: 'laminar' }), fact(2, { regime: 'transitional' }), fact(3)], [fact(1, { regime: 'laminar' }), fact(2, { regime: 'laminar' }), fact(3, { regime: 'transitional' })], 0.3);
    expect(w.find((x) => x.code === 'laminar-at-design')).toMatchObject({ severity: 'critical', circuits: [1] });
    expect(w.find((x) => x.code === 'transitional-at-design')).toMatchObject({ severity: 'warning', circuits: [2] });
    expect(w.find((x) => x.code === 'laminar-at-minimum-flow')).toMatchObject({ severity: 'critical', circuits: [2] });
    expect(w.find((x) => x.code === 'transitional-at-minimum-flow')).toMatchObject({ circuits: [3] });
  });
  it('velocity: 0.6 m/s air sweeping where a circuit runs downward, 0.3 m/s otherwise (2.4, 2.5 [CP])', () => {
    const w = velocityWarnings([fact(1, { velocity_m_s: 0.5, runsDownward: true }), fact(2, { velocity_m_s: 0.5 }), fact(3, { velocity_m_s: 0.25 })]);
    expect(w.find((x) => x.code === 'velocity-air-sweep')?.circuits).toEqual([1]);
    expect(w.find((x) => x.code === 'velocity-low')?.circuits).toEqual([3]);
  });
  it('erosion limit by water temperature: 2.4 / 1.5 / 0.9 m/s (2.5 [S: failure-analysis article])', () => {
    expect(erosionVelocityLimit_m_s(7)).toBe(2.4);
    expect(erosionVelocityLimit_m_s(50)).toBe(1.5);
    expect(erosionVelocityLimit_m_s(80)).toBe(0.9);
    expect(velocityWarnings([fact(1, { velocityMax_m_s: 1.2, maxTemperature_C: 82 })]).map((x) => x.code)).toEqual(['velocity-erosion']);
    expect(velocityWarnings([fact(1, { velocityMax_m_s: 1.2, maxTemperature_C: 12 })])).toEqual([]);
  });
  it('pressure drop above 45 kPa (or the team limit) is critical', () => {
    expect(pressureDropWarnings(46000)[0].severity).toBe('critical');
    expect(pressureDropWarnings(44000)).toEqual([]);
    expect(pressureDropWarnings(31000, 30000)).toHaveLength(1);
  });
  it('freeze: plain water with air below 0 °C, glycol not 3 K below the minimum air, laminar at minimum flow with cold air (2.6)', () => {
    expect(freezeWarnings({ fluidKind: 'water', freezingPoint_C: 0, minimumAirTemperature_C: -5, laminarAtMinimumFlow: [] })[0].code).toBe('freeze-plain-water');
    expect(freezeWarnings({ fluidKind: 'ethylene-glycol', freezingPoint_C: -14.58, minimumAirTemperature_C: -12, laminarAtMinimumFlow: [] })[0].code).toBe('freeze-glycol-weak');
    expect(freezeWarnings({ fluidKind: 'ethylene-glycol', freezingPoint_C: -14.58, minimumAirTemperature_C: -11, laminarAtMinimumFlow: [] })).toEqual([]);
    expect(freezeWarnings({ fluidKind: 'ethylene-glycol', freezingPoint_C: -30, minimumAirTemperature_C: 0, laminarAtMinimumFlow: [4] })[0].code).toBe('freeze-laminar');
    expect(freezeWarnings({ fluidKind: 'water', freezingPoint_C: 0, minimumAirTemperature_C: null, laminarAtMinimumFlow: [1] })).toEqual([]);
  });
  it('wet face velocity over 2.5 m/s, energy balance over 1e-4, part-load capacity stated', () => {
    expect(wetFaceVelocityWarnings(2.8, 0.01)).toHaveLength(1);
    expect(wetFaceVelocityWarnings(2.8, 0)).toEqual([]);
    expect(energyBalanceWarnings(2e-4)).toHaveLength(1);
    expect(energyBalanceWarnings(5e-5)).toEqual([]);
    expect(partLoadWarnings([2], 0.3, 12000, 40000)[0].message).toMatch(/12\.0 kW \(30 % of design\)/);
  });
  it('flags temperatures that cross (a solver defect)', () => {
    expect(solverDefectWarnings({ mode: 'heating', leavingAirDryBulb_C: 81, leavingWaterTemperature_C: 60 }, 80, 10)).toHaveLength(1);
    expect(solverDefectWarnings({ mode: 'cooling', leavingAirDryBulb_C: 6, leavingWaterTemperature_C: 12 }, 7, 27)).toHaveLength(1);
    expect(solverDefectWarnings({ mode: 'cooling', leavingAirDryBulb_C: 14, leavingWaterTemperature_C: 12 }, 7, 27)).toEqual([]);
  });
});
