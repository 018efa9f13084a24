import { describe, expect, it } from 'vitest';
import { billOfMaterialsLines } from '@/components/coil/bill-of-materials-lines';
import type { BillOfMaterials } from '@/lib/engine/types';

// A 2-row x 4-tube coil in two circuits counted by hand: 8 tubes of 1.2192 m, 4 hairpins at the opposite end
// (2 same-row, 2 next-row), 2 return bends, 4 stubs, braze joints 2 x 2 + 4 = 8.
const bom: BillOfMaterials = {
  tubes: 8,
  straightTubeLength_m: 8 * 1.2192,
  hairpins: [
    { span: 'same row, 1 pitch', count: 2 },
    { span: 'next row', count: 2 },
  ],
  hairpinCount: 4,
  returnBends: 2,
  crossovers: 0,
  headerStubs: 4,
  brazeJoints: 8,
  internalVolume_m3: 0.00108,
  finCount: 480,
  finArea_m2: 4.5,
  finMass_kg: 1.8,
  copperMass_kg: 1.4,
  operatingWaterMass_kg: 1.08,
};

describe('bill of materials lines', () => {
  it('lists every item with its count or quantity and unit (SI)', () => {
    const lines = billOfMaterialsLines(bom, 'si');
    const byLabel = new Map(lines.map((l) => [l.label.trim(), `${l.value} ${l.unit}`]));
    expect(byLabel.get('Tubes')).toBe('8 pcs');
    expect(byLabel.get('Straight tube length, total')).toBe('9.8 m');
    expect(byLabel.get('Hairpins')).toBe('4 pcs');
    expect(byLabel.get('hairpins, next row')).toBe('2 pcs');
    expect(byLabel.get('Return bends')).toBe('2 pcs');
    expect(byLabel.get('Braze joints')).toBe('8 joints');
    expect(byLabel.get('Internal water volume')).toBe('1.08 L');
    expect(byLabel.get('Fins')).toBe('480 pcs');
  });

  it('converts lengths, volumes and masses to IP (NIST SP 811 factors)', () => {
    const byLabel = new Map(billOfMaterialsLines(bom, 'ip').map((l) => [l.label.trim(), `${l.value} ${l.unit}`]));
    expect(byLabel.get('Straight tube length, total')).toBe('32 ft'); // 9.7536 m / 0.3048
    expect(byLabel.get('Copper tube mass')).toBe('3.09 lb'); // 1.4 kg / 0.45359237
    expect(byLabel.get('Internal water volume')).toBe('0.29 US gal'); // 1.08 L / 3.785411784
  });
});
