/**
 * Change operating conditions. Air humidity is given by exactly one of wet bulb or relative humidity
 * (ARCHITECTURE.md section 2), so setting one removes the other. Plain water carries no glycol.
 */
import type { Air, CoilDocument, Conditions, Fluid } from '@/lib/engine/types';

export interface SetConditionsArgs {
  air?: Partial<Air>;
  fluid?: Partial<Fluid>;
  minimumFlowFraction?: number;
  minimumAirTemperature_C?: number | null;
}

export function setConditions(doc: CoilDocument, args: SetConditionsArgs): void {
  const c: Conditions = doc.conditions;
  if (args.air) {
    Object.assign(c.air, args.air);
    if (args.air.inletWetBulb_C !== undefined) delete c.air.inletRelativeHumidity;
    else if (args.air.inletRelativeHumidity !== undefined) delete c.air.inletWetBulb_C;
  }
  if (args.fluid) {
    Object.assign(c.fluid, args.fluid);
    if (c.fluid.kind === 'water') c.fluid.glycolMassFraction = 0;
  }
  if (args.minimumFlowFraction !== undefined) c.minimumFlowFraction = args.minimumFlowFraction;
  if (args.minimumAirTemperature_C !== undefined) c.minimumAirTemperature_C = args.minimumAirTemperature_C;
}
