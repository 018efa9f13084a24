/**
 * Words and units for a changed setting between two versions, from its dotted document path
 * ("conditions.fluid.massFlow_kg_s"): the field's unit suffix says which quantity it is (ARCHITECTURE.md 2).
 */
import { formatQuantity, type QuantityKind, type UnitSystem } from '@/lib/units';

const WORDS: Record<string, string> = {
  rows: 'Rows',
  tubesPerRow: 'Tubes high',
  tubeOuterDiameter: 'Tube outside diameter',
  tubeWall: 'Tube wall',
  transversePitch: 'Tube pitch',
  rowPitch: 'Row pitch',
  finnedLength: 'Finned length',
  faceVelocity: 'Face velocity',
  inletDryBulb: 'Entering air dry bulb',
  inletWetBulb: 'Entering air wet bulb',
  inletRelativeHumidity: 'Entering air relative humidity',
  inletTemperature: 'Entering water',
  massFlow: 'Water mass flow',
  glycolMassFraction: 'Glycol mass fraction',
  minimumFlowFraction: 'Minimum flow fraction',
  minimumAirTemperature: 'Minimum air temperature',
  altitude: 'Altitude',
  kind: 'Kind',
  name: 'Name',
};

function kindOf(path: string, field: string): QuantityKind | null {
  if (field.endsWith('_C')) return 'temperature';
  if (field.endsWith('_kg_s')) return 'massFlow';
  if (field.endsWith('_m_s')) return path.includes('.air.') ? 'faceVelocity' : 'velocity';
  if (field.endsWith('_Pa')) return 'waterPressureDrop';
  if (field.endsWith('_m')) return field.startsWith('finnedLength') || field.startsWith('altitude') ? 'length' : 'smallLength';
  return null;
}

const SUFFIX = /_(C|kg_s|m_s|Pa|m|W_mK|m2K_W)$/;

export function settingLabel(path: string): string {
  const parts = path.split('.');
  const field = parts[parts.length - 1];
  const base = field.replace(SUFFIX, '');
  const word = WORDS[base] ?? base.replace(/([a-z])([A-Z])/g, '$1 $2').replace(/^./, (c) => c.toUpperCase());
  const owner = parts.length > 1 ? parts[parts.length - 2] : '';
  return owner === 'fin' ? `Fin ${word.toLowerCase()}` : word;
}

export function settingValue(path: string, value: string | number | boolean | null, system: UnitSystem): string {
  if (value === null) return '—';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'string') return value;
  const field = path.split('.').pop() ?? '';
  const kind = kindOf(path, field);
  if (kind) return formatQuantity(kind, value, system).label;
  if (field.endsWith('_W_mK')) return `${value} W/(m·K)`;
  return String(value);
}
