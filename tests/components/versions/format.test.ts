import { describe, expect, it } from 'vitest';
import { formatResultDifference, formatResultValue, resultFigureLabel } from '@/components/versions/format';
import { settingLabel, settingValue } from '@/components/versions/setting-format';

describe('compared result figures', () => {
  it('shows values with the unit of the user’s system', () => {
    expect(formatResultValue('capacity_W', 52300, 'si')).toBe('52.3 kW');
    expect(formatResultValue('waterPressureDrop_Pa', 24500, 'si')).toBe('24.5 kPa');
    expect(formatResultValue('circuitCount', 8, 'si')).toBe('8');
    expect(formatResultValue('capacity_W', null, 'si')).toBe('—');
    expect(resultFigureLabel('leavingWaterTemperature_C')).toBe('Leaving water');
  });

  it('signs differences, shows small ones with more decimals, and writes "no change" only for none', () => {
    expect(formatResultDifference({ key: 'capacity_W', a: 50000, b: 52300, difference: 2300 }, 'si')).toBe('+2.3 kW');
    expect(formatResultDifference({ key: 'waterPressureDrop_Pa', a: 30000, b: 24500, difference: -5500 }, 'si')).toBe('-5.5 kPa');
    expect(formatResultDifference({ key: 'circuitCount', a: 8, b: 8, difference: 0 }, 'si')).toBe('no change');
    expect(formatResultDifference({ key: 'waterPressureDrop_Pa', a: 8040, b: 8000, difference: -40 }, 'si')).toBe('-0.04 kPa');
    expect(formatResultDifference({ key: 'capacity_W', a: 50000, b: 50000.001, difference: 0.001 }, 'si')).toBe('no change');
    expect(formatResultDifference({ key: 'capacity_W', a: null, b: 1, difference: null }, 'si')).toBe('—');
  });

  it('gives a temperature difference as a difference: 2 K is 3.6 °F, not 35.6 °F (1 K = 1.8 °F, from memory)', () => {
    expect(formatResultDifference({ key: 'leavingAirDryBulb_C', a: 13, b: 15, difference: 2 }, 'ip')).toBe('+3.6 °F');
    expect(formatResultDifference({ key: 'leavingAirDryBulb_C', a: 13, b: 15, difference: 2 }, 'si')).toBe('+2.0 K');
  });
});

describe('changed settings', () => {
  it('names a setting from its document path', () => {
    expect(settingLabel('conditions.fluid.massFlow_kg_s')).toBe('Water mass flow');
    expect(settingLabel('geometry.fin.pitch_m')).toBe('Fin pitch');
    expect(settingLabel('geometry.tubesPerRow')).toBe('Tubes high');
  });

  it('formats a setting’s value in the unit its field names (1 ft/min = 0.00508 m/s, from memory)', () => {
    expect(settingValue('conditions.fluid.massFlow_kg_s', 1.2, 'si')).toBe('1.200 kg/s');
    expect(settingValue('conditions.air.faceVelocity_m_s', 2.54, 'ip')).toBe('500 fpm');
    expect(settingValue('geometry.finnedLength_m', 1.2192, 'ip')).toBe('48.00 in');
    expect(settingValue('conditions.fluid.kind', 'water', 'si')).toBe('water');
    expect(settingValue('conditions.minimumAirTemperature_C', null, 'si')).toBe('—');
  });
});
