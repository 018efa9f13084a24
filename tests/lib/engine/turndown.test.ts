import { describe, expect, it } from 'vitest';
import { crossingFraction, fractionAtReynolds, turndownFractions, TURNDOWN_FRACTIONS } from '@/lib/engine/turndown';
import { solveCoil } from '@/lib/engine/solve-coil';
import { serpentineCircuiting } from '@/lib/engine/generators';
import type { CoilDocument, Geometry } from '@/lib/engine/types';

describe('turndown fractions (ENGINEERING.md section 5 item 1)', () => {
  it('are 0.1 … 1.0 in steps of 0.1 plus the minimum flow fraction, sorted, without duplicates', () => {
    expect(TURNDOWN_FRACTIONS).toHaveLength(10);
    expect(turndownFractions(0.35)).toEqual([0.1, 0.2, 0.3, 0.35, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1]);
    expect(turndownFractions(0.3)).toHaveLength(10);
  });
  it('crossing of a Re threshold is interpolated between solved points', () => {
    const pts = [
      { flowFraction: 0.2, reynoldsMin: 1000 },
      { flowFraction: 0.4, reynoldsMin: 3000 },
      { flowFraction: 1, reynoldsMin: 9000 },
    ];
    expect(crossingFraction(pts, 4000)).toBeCloseTo(0.4 + (1000 / 6000) * 0.6, 12);
    expect(crossingFraction(pts, 2300)).toBeCloseTo(0.2 + (1300 / 2000) * 0.2, 12);
    expect(crossingFraction(pts, 500)).toBeNull();
    expect(crossingFraction(pts, 10000)).toBe(1);
  });
  it('the proportional estimate (Re ∝ flow) gives threshold / design Re', () => {
    expect(fractionAtReynolds(8000, 4000)).toBeCloseTo(0.5, 12);
    expect(fractionAtReynolds(3000, 4000)).toBe(1);
    expect(fractionAtReynolds(100000, 2300)).toBeNull();
  });
});

describe('turndown in the solve result', () => {
  const geometry: Geometry = {
    rows: 4,
    tubesPerRow: 8,
    layout: 'staggered',
    tubeOuterDiameter_m: 0.0127,
    tubeWall_m: 0.00041,
    transversePitch_m: 0.03175,
    rowPitch_m: 0.0275,
    finnedLength_m: 1,
    fin: { type: 'plain', thickness_m: 0.00015, pitch_m: 0.00254, conductivity_W_mK: 200 },
    tubeConductivity_W_mK: 390,
  };
  const doc: CoilDocument = {
    schemaVersion: 1,
    name: 'turndown check',
    geometry,
    circuiting: serpentineCircuiting(geometry, 8),
    conditions: {
      air: { faceVelocity_m_s: 2.5, inletDryBulb_C: 27, inletWetBulb_C: 19.5, altitude_m: 0 },
      fluid: { kind: 'water', glycolMassFraction: 0, inletTemperature_C: 7, massFlow_kg_s: 0.8 },
      minimumFlowFraction: 0.25,
      minimumAirTemperature_C: null,
    },
  };
  const r = solveCoil(doc);
  it('lists every fraction with capacity, lowest Re and pressure drop rising with flow', () => {
    const t = r.turndown!;
    expect(t.map((p) => p.flowFraction)).toEqual(turndownFractions(0.25));
    for (let i = 1; i < t.length; i++) {
      expect(t[i].capacity_W!).toBeGreaterThan(t[i - 1].capacity_W!);
      expect(t[i].minReynolds).toBeGreaterThan(t[i - 1].minReynolds);
      expect(t[i].waterPressureDrop_Pa).toBeGreaterThan(t[i - 1].waterPressureDrop_Pa);
    }
    expect(t[t.length - 1].capacity_W).toBe(r.totals.capacity_W);
  });
  it('gives each circuit the fraction below which it turns transitional and laminar', () => {
    for (const c of r.circuits) {
      expect(c.transitionalBelowFlowFraction).toBeGreaterThan(c.laminarBelowFlowFraction!);
      expect(c.transitionalBelowFlowFraction).toBeLessThanOrEqual(1);
    }
  });
});
