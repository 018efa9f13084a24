/**
 * Built-in starting points for a new coil: the two dominant water-coil tube sizes with the typical geometry of
 * ENGINEERING.md 1.1 and sensible default conditions, each returned as a complete coil document with a generated
 * full-serpentine circuiting.
 */
import { serpentineCircuiting } from '@/lib/engine/generators';
import type { Conditions, CoilDocument, Geometry } from '@/lib/engine/types';

export type StartingPointId = 'half-inch' | 'five-eighths-inch';
export type CoilMode = 'cooling' | 'heating';

type TubeSheet = Omit<Geometry, 'rows' | 'tubesPerRow' | 'finnedLength_m'>;

export interface StartingPoint {
  id: StartingPointId;
  label: string;
  description: string;
  sheet: TubeSheet;
  rows: { min: number; max: number; default: number };
  defaultTubesPerRow: number;
  defaultFinnedLength_m: number;
}

const FPI_10 = 0.0254 / 10;
/** Aluminium fin, 0.15 mm, 10 fins per inch (ENGINEERING.md 1.1: 0.006 in the usual default; Al 1100/3003 about 200 W/(m K)). */
const aluminiumFin = { type: 'plain', thickness_m: 0.00015, pitch_m: FPI_10, conductivity_W_mK: 200 } as const;

export const STARTING_POINTS: readonly StartingPoint[] = [
  {
    id: 'half-inch',
    label: '1/2 in tubes, 1.25 in pitch',
    description: '12.7 mm copper tube, 0.41 mm wall, 31.75 x 27.5 mm equilateral pitch, 0.15 mm aluminium fins at 10 FPI',
    sheet: {
      layout: 'staggered',
      tubeOuterDiameter_m: 0.0127,
      tubeWall_m: 0.00041,
      transversePitch_m: 0.03175,
      rowPitch_m: 0.0275,
      fin: { ...aluminiumFin },
      tubeConductivity_W_mK: 340,
    },
    rows: { min: 1, max: 8, default: 4 },
    defaultTubesPerRow: 24,
    defaultFinnedLength_m: 1.2192,
  },
  {
    id: 'five-eighths-inch',
    label: '5/8 in tubes, 1.5 in pitch',
    description: '15.88 mm copper tube, 0.51 mm wall, 38.1 x 33.0 mm equilateral pitch, 0.15 mm aluminium fins at 10 FPI',
    sheet: {
      layout: 'staggered',
      tubeOuterDiameter_m: 0.015875,
      tubeWall_m: 0.00051,
      transversePitch_m: 0.0381,
      rowPitch_m: 0.033,
      fin: { ...aluminiumFin },
      tubeConductivity_W_mK: 340,
    },
    rows: { min: 1, max: 8, default: 4 },
    defaultTubesPerRow: 20,
    defaultFinnedLength_m: 1.2192,
  },
];

export function startingPoint(id: StartingPointId): StartingPoint {
  const found = STARTING_POINTS.find((p) => p.id === id);
  if (!found) throw new RangeError(`unknown starting point "${id}"`);
  return found;
}

/**
 * Default conditions. Cooling: air 27 degC dry bulb / 19.5 degC wet bulb at 2.5 m/s (the dehumidifying face-velocity
 * limit of ENGINEERING.md 2.5), chilled water 7 degC. Heating: air 5 degC at 50 % RH, 2.5 m/s, hot water 80 degC.
 * Water flow from a tube velocity of 1.0 m/s (cooling) or 0.6 m/s (heating, the hot-water erosion guidance of 2.5)
 * in every circuit, with 1000 kg/m3 (a round figure: the user sets the real flow).
 */
export function defaultConditions(mode: CoilMode, geometry: Geometry, circuits: number): Conditions {
  const di = geometry.tubeOuterDiameter_m - 2 * geometry.tubeWall_m;
  const velocity = mode === 'cooling' ? 1.0 : 0.6;
  const massFlow = Math.round(1000 * velocity * ((Math.PI * di * di) / 4) * Math.max(circuits, 1) * 1000) / 1000;
  if (mode === 'cooling') {
    return {
      air: { faceVelocity_m_s: 2.5, inletDryBulb_C: 27, inletWetBulb_C: 19.5, altitude_m: 0 },
      fluid: { kind: 'water', glycolMassFraction: 0, inletTemperature_C: 7, massFlow_kg_s: Math.max(massFlow, 0.01) },
      minimumFlowFraction: 0.3,
      minimumAirTemperature_C: null,
    };
  }
  return {
    air: { faceVelocity_m_s: 2.5, inletDryBulb_C: 5, inletRelativeHumidity: 0.5, altitude_m: 0 },
    fluid: { kind: 'water', glycolMassFraction: 0, inletTemperature_C: 80, massFlow_kg_s: Math.max(massFlow, 0.01) },
    minimumFlowFraction: 0.3,
    minimumAirTemperature_C: null,
  };
}

export interface StartingPointChoice {
  rows?: number;
  tubesPerRow?: number;
  finnedLength_m?: number;
  mode?: CoilMode;
  name?: string;
}

/** The geometry of a starting point at the chosen size. Throws RangeError for rows outside the starting point's range. */
export function startingPointGeometry(id: StartingPointId, choice: StartingPointChoice = {}): Geometry {
  const p = startingPoint(id);
  const rows = choice.rows ?? p.rows.default;
  if (!Number.isInteger(rows) || rows < p.rows.min || rows > p.rows.max) {
    throw new RangeError(`starting points have ${p.rows.min} to ${p.rows.max} rows`);
  }
  const tubesPerRow = choice.tubesPerRow ?? p.defaultTubesPerRow;
  if (!Number.isInteger(tubesPerRow) || tubesPerRow < 1 || tubesPerRow > 80) throw new RangeError('tubes per row must be 1 to 80');
  return {
    ...p.sheet,
    fin: { ...p.sheet.fin },
    rows,
    tubesPerRow,
    finnedLength_m: choice.finnedLength_m ?? p.defaultFinnedLength_m,
  };
}

/** A complete coil document from a starting point, circuited full serpentine (feeds = tubes high, counterflow). */
export function startingPointDocument(id: StartingPointId, choice: StartingPointChoice = {}): CoilDocument {
  const geometry = startingPointGeometry(id, choice);
  const mode = choice.mode ?? 'cooling';
  return {
    schemaVersion: 1,
    name: choice.name ?? `${geometry.rows}-row ${mode} coil`,
    geometry,
    circuiting: serpentineCircuiting(geometry, geometry.tubesPerRow),
    conditions: defaultConditions(mode, geometry, geometry.tubesPerRow),
  };
}

/** A new, undrawn coil: the 1/2 in starting point at 4 rows x 24 tubes with no bends or headers yet. */
export function blankCoilDocument(name = 'New coil'): CoilDocument {
  const geometry = startingPointGeometry('half-inch');
  return {
    schemaVersion: 1,
    name,
    geometry,
    circuiting: { bends: [], supply: [], return: [] },
    conditions: defaultConditions('cooling', geometry, geometry.tubesPerRow),
  };
}
