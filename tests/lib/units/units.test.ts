// Every factor is checked against the exact definitions of NIST Special Publication 811 (2008), Appendix B:
// 1 in = 0.0254 m, 1 ft = 0.3048 m, 1 US gal = 3.785411784 L, 1 lb = 0.45359237 kg, 1 Btu_IT = 1055.05585262 J
// (so 1 Btu_IT/h = 0.29307107 W), standard gravity 9.80665 m/s2, conventional inch/foot of water (1000 kg/m3).
import { describe, expect, it } from 'vitest';
import {
  BTU_PER_HOUR_W,
  FOOT_OF_WATER_Pa,
  INCH_OF_WATER_Pa,
  PSI_Pa,
  QUANTITY_KINDS,
  formatNumber,
  formatQuantity,
  fromDisplay,
  massFlowFromVolumeFlow,
  toDisplay,
  unitLabel,
  volumeFlowFromMassFlow,
} from '@/lib/units';

const close = (a: number, b: number, rel = 1e-12) => expect(Math.abs(a - b)).toBeLessThanOrEqual(rel * Math.abs(b));

describe('definitions (NIST SP 811)', () => {
  it('IT Btu per hour, water columns, psi', () => {
    close(BTU_PER_HOUR_W, 0.29307107, 1e-8);
    close(INCH_OF_WATER_Pa, 249.0889, 1e-7); // NIST SP 811: inch of water, conventional = 2.490889 E+02 Pa
    close(FOOT_OF_WATER_Pa, 2989.067, 1e-7); // foot of water, conventional = 2.989067 E+03 Pa
    close(PSI_Pa, 6894.757, 1e-7); // pound-force per square inch = 6.894757 E+03 Pa
  });
});

describe('toDisplay (exact factors)', () => {
  it('velocities: 0.3048 m/s = 1 ft/s; 0.00508 m/s = 1 fpm', () => {
    close(toDisplay('velocity', 0.3048, 'ip'), 1);
    close(toDisplay('faceVelocity', 2.54, 'ip'), 500);
    close(toDisplay('faceVelocity', 2.5, 'si'), 2.5);
  });
  it('flows: 1 US gpm = 3.785411784 L/min; 1 cfm = 0.3048^3/60 m3/s; 1 lb/h = 0.45359237/3600 kg/s', () => {
    close(toDisplay('volumeFlow', 3.785411784e-3 / 60, 'ip'), 1);
    close(toDisplay('volumeFlow', 1e-3, 'si'), 1);
    close(toDisplay('airflow', 0.3048 ** 3 / 60, 'ip'), 1);
    close(toDisplay('massFlow', 0.45359237 / 3600, 'ip'), 1);
  });
  it('pressures: kPa, ft of water, Pa, in. w.g.', () => {
    close(toDisplay('waterPressureDrop', 29890.67, 'ip'), 10, 1e-7);
    close(toDisplay('waterPressureDrop', 45000, 'si'), 45);
    close(toDisplay('airPressureDrop', 249.0889, 'ip'), 1, 1e-7);
  });
  it('power: kW, MBH, W, Btu/h', () => {
    close(toDisplay('power', 1000 * 1055.05585262 / 3600, 'ip'), 1);
    close(toDisplay('power', 71365, 'si'), 71.365);
    close(toDisplay('powerSmall', 1055.05585262 / 3600, 'ip'), 1);
  });
  it('temperatures and differences: 0 degC = 32 degF, 100 degC = 212 degF, 1 K = 1.8 degF', () => {
    close(toDisplay('temperature', 100, 'ip'), 212);
    expect(toDisplay('temperature', 0, 'ip')).toBe(32);
    close(toDisplay('temperature', -40, 'ip'), -40);
    close(toDisplay('temperatureDifference', 10, 'ip'), 18);
  });
  it('lengths, areas, volumes, masses', () => {
    close(toDisplay('length', 1.2192, 'ip'), 48);
    close(toDisplay('smallLength', 0.0127, 'ip'), 0.5);
    close(toDisplay('smallLength', 0.0127, 'si'), 12.7);
    close(toDisplay('area', 0.3048 ** 2, 'ip'), 1);
    close(toDisplay('volume', 3.785411784e-3, 'ip'), 1);
    close(toDisplay('mass', 0.45359237, 'ip'), 1);
  });
  it('humidity ratio: 1 g/kg = 7 gr/lb (7000 grains per pound)', () => {
    close(toDisplay('humidityRatio', 0.001, 'ip'), 7);
    close(toDisplay('humidityRatio', 0.0105, 'si'), 10.5);
  });
});

describe('fromDisplay inverts toDisplay for every kind and system', () => {
  for (const kind of QUANTITY_KINDS) {
    for (const system of ['si', 'ip'] as const) {
      it(`${kind} (${system}, ${unitLabel(kind, system)})`, () => {
        for (const v of [-12.5, 0, 0.37, 7, 1234.5]) close(fromDisplay(kind, toDisplay(kind, v, system), system) + 1e-300, v + 1e-300, 1e-12);
      });
    }
  }
});

describe('volume flow from mass flow', () => {
  it('1 kg/s of water at 1000 kg/m3 is 1 L/s = 15.850 gpm', () => {
    const q = volumeFlowFromMassFlow(1, 1000);
    close(toDisplay('volumeFlow', q, 'ip'), 60 / 3.785411784);
    close(massFlowFromVolumeFlow(q, 1000), 1);
    expect(() => volumeFlowFromMassFlow(1, 0)).toThrow(RangeError);
  });
});

describe('formatQuantity', () => {
  it('returns value, text, unit and label with the kind default decimals', () => {
    const f = formatQuantity('faceVelocity', 2.54, 'ip');
    expect(f).toMatchObject({ text: '500', unit: 'fpm', label: '500 fpm' });
    close(f.value, 500);
    expect(formatQuantity('temperature', 7, 'ip').label).toBe('44.6 °F');
    expect(formatQuantity('waterPressureDrop', 583.3, 'si').label).toBe('0.6 kPa');
    expect(formatQuantity('power', 71365, 'ip', { digits: 0 }).label).toBe('244 MBH');
  });
  it('never shows a negative zero and shows a dash for non-finite values', () => {
    expect(formatNumber(-0.0001, 2)).toBe('0.00');
    expect(formatQuantity('temperature', Number.NaN, 'si').label).toBe('—');
  });
});
