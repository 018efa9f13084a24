/** A small coil document for the editor store tests (invented data; geometry from ENGINEERING.md 1.1, 1/2 in row). */
import type { CoilDocument } from '@/lib/engine/types';

export function smallCoil(rows = 2, tubesPerRow = 4): CoilDocument {
  return {
    schemaVersion: 1,
    name: 'Test coil',
    geometry: {
      rows,
      tubesPerRow,
      layout: 'staggered',
      tubeOuterDiameter_m: 0.0127,
      tubeWall_m: 0.000406,
      transversePitch_m: 0.03175,
      rowPitch_m: 0.0275,
      finnedLength_m: 1.0,
      fin: { type: 'plain', thickness_m: 0.00015, pitch_m: 0.00254, conductivity_W_mK: 200 },
      tubeConductivity_W_mK: 390,
    },
    circuiting: { bends: [], supply: [], return: [] },
    conditions: {
      air: { faceVelocity_m_s: 2.5, inletDryBulb_C: 27, inletWetBulb_C: 19.5, altitude_m: 0 },
      fluid: { kind: 'water', glycolMassFraction: 0, inletTemperature_C: 7, massFlow_kg_s: 0.5 },
      minimumFlowFraction: 0.3,
      minimumAirTemperature_C: null,
    },
  };
}
