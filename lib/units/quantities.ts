/**
 * The quantities the product shows, each with its SI and IP display unit, and the conversions between the SI value
 * the engine uses and the number a form shows. Definitions in ./definitions (NIST SP 811).
 */
import {
  BTU_PER_HOUR_W,
  FOOT_m,
  FOOT_OF_WATER_Pa,
  GRAIN_kg,
  INCH_m,
  INCH_OF_WATER_Pa,
  POUND_kg,
  US_GALLON_m3,
  celsiusToFahrenheit,
  fahrenheitToCelsius,
} from '@/lib/units/definitions';

export type UnitSystem = 'si' | 'ip';

export type QuantityKind =
  | 'velocity' // water velocity in tubes: m/s | ft/s
  | 'faceVelocity' // air face velocity: m/s | fpm
  | 'massFlow' // kg/s | lb/h
  | 'volumeFlow' // liquid flow, SI value m3/s: L/s | US gpm
  | 'waterPressureDrop' // Pa SI value: kPa | ft of water
  | 'airPressureDrop' // Pa: Pa | in. w.g.
  | 'power' // W SI value: kW | MBH (1000 Btu/h)
  | 'powerSmall' // W | Btu/h
  | 'temperature' // degC | degF
  | 'temperatureDifference' // K | degF
  | 'length' // m | in (finned length, coil dimensions)
  | 'smallLength' // m SI value: mm | in (tube diameter, wall, pitches)
  | 'area' // m2 | ft2
  | 'airflow' // m3/s | cfm
  | 'humidityRatio' // kg/kg SI value: g/kg | gr/lb
  | 'volume' // m3 SI value: L | US gal
  | 'mass' // kg | lb
  | 'longLength' // m | ft (totals such as the straight tube length of a coil)
  | 'condensateFlow'; // kg/s SI value: kg/h | lb/h (condensate off a cooling coil)

interface UnitDef {
  unit: string;
  /** display = toDisplay(SI) */
  to: (si: number) => number;
  /** SI = from(display) */
  from: (display: number) => number;
  /** default decimals for formatting */
  decimals: number;
}

const linear = (unit: string, siPerUnit: number, decimals: number): UnitDef => ({
  unit,
  to: (si) => si / siPerUnit,
  from: (d) => d * siPerUnit,
  decimals,
});

const MINUTE_s = 60;
const HOUR_s = 3600;

export const UNITS: Record<QuantityKind, Record<UnitSystem, UnitDef>> = {
  velocity: { si: linear('m/s', 1, 2), ip: linear('ft/s', FOOT_m, 2) },
  faceVelocity: { si: linear('m/s', 1, 2), ip: linear('fpm', FOOT_m / MINUTE_s, 0) },
  massFlow: { si: linear('kg/s', 1, 3), ip: linear('lb/h', POUND_kg / HOUR_s, 0) },
  volumeFlow: { si: linear('L/s', 1e-3, 2), ip: linear('gpm', US_GALLON_m3 / MINUTE_s, 1) },
  waterPressureDrop: { si: linear('kPa', 1000, 1), ip: linear('ft of water', FOOT_OF_WATER_Pa, 1) },
  airPressureDrop: { si: linear('Pa', 1, 0), ip: linear('in. w.g.', INCH_OF_WATER_Pa, 2) },
  power: { si: linear('kW', 1000, 1), ip: linear('MBH', 1000 * BTU_PER_HOUR_W, 1) },
  powerSmall: { si: linear('W', 1, 0), ip: linear('Btu/h', BTU_PER_HOUR_W, 0) },
  temperature: {
    si: { unit: '°C', to: (c) => c, from: (c) => c, decimals: 1 },
    ip: { unit: '°F', to: celsiusToFahrenheit, from: fahrenheitToCelsius, decimals: 1 },
  },
  temperatureDifference: { si: linear('K', 1, 1), ip: linear('°F', 1 / 1.8, 1) },
  length: { si: linear('m', 1, 3), ip: linear('in', INCH_m, 2) },
  smallLength: { si: linear('mm', 1e-3, 2), ip: linear('in', INCH_m, 3) },
  area: { si: linear('m²', 1, 3), ip: linear('ft²', FOOT_m * FOOT_m, 2) },
  airflow: { si: linear('m³/s', 1, 3), ip: linear('cfm', (FOOT_m * FOOT_m * FOOT_m) / MINUTE_s, 0) },
  humidityRatio: { si: linear('g/kg', 1e-3, 2), ip: linear('gr/lb', GRAIN_kg / POUND_kg, 1) },
  volume: { si: linear('L', 1e-3, 2), ip: linear('US gal', US_GALLON_m3, 2) },
  mass: { si: linear('kg', 1, 2), ip: linear('lb', POUND_kg, 2) },
  longLength: { si: linear('m', 1, 1), ip: linear('ft', FOOT_m, 0) },
  condensateFlow: { si: linear('kg/h', 1 / HOUR_s, 1), ip: linear('lb/h', POUND_kg / HOUR_s, 1) },
};

export const QUANTITY_KINDS = Object.keys(UNITS) as QuantityKind[];

/** The unit label a value of this kind shows in this system ("fpm", "kPa", "°F"). */
export function unitLabel(kind: QuantityKind, system: UnitSystem): string {
  return UNITS[kind][system].unit;
}

/** The number a form shows for an SI value. */
export function toDisplay(kind: QuantityKind, valueSI: number, system: UnitSystem): number {
  return UNITS[kind][system].to(valueSI);
}

/** The SI value of a number typed into a form. */
export function fromDisplay(kind: QuantityKind, displayValue: number, system: UnitSystem): number {
  return UNITS[kind][system].from(displayValue);
}

/** Liquid volume flow, m3/s, from mass flow and density (for L/s and gpm displays). */
export function volumeFlowFromMassFlow(massFlow_kg_s: number, density_kg_m3: number): number {
  if (!(density_kg_m3 > 0)) throw new RangeError('density must be positive');
  return massFlow_kg_s / density_kg_m3;
}

/** Mass flow, kg/s, from a liquid volume flow and density. */
export function massFlowFromVolumeFlow(volumeFlow_m3_s: number, density_kg_m3: number): number {
  if (!(density_kg_m3 > 0)) throw new RangeError('density must be positive');
  return volumeFlow_m3_s * density_kg_m3;
}
