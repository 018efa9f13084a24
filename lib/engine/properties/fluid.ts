// The one entry point the solver uses for tube-side fluid properties.
// Water: IF97 region 1 + IAPWS 2008 + IAPWS 2011 at 0.3 MPa (ENGINEERING.md v1 decision 10).
// Glycols: Melinder (2010) polynomials (ENGINEERING.md 3.2).
import type { FluidKind } from '@/lib/engine/types';
import { waterPropertiesIapwsInto } from '@/lib/engine/properties/water-iapws';
import {
  freezingPointMelinder2010_C,
  glycolPropertiesMelinder2010Into,
  MELINDER_MAX_TEMPERATURE_C,
} from '@/lib/engine/properties/glycol-melinder';

export interface FluidProperties {
  density_kg_m3: number;
  specificHeat_J_kgK: number;
  viscosity_Pa_s: number;
  conductivity_W_mK: number;
  prandtl: number;
}

/** What fluidProperties needs to know about the circulating fluid. */
export interface FluidSpec {
  kind: FluidKind;
  glycolMassFraction: number;
}

/** System pressure assumed for water properties [Pa] (v1 decision 10). */
export const WATER_PRESSURE_PA = 0.3e6;
/** Highest water temperature accepted [°C]: stays liquid at 0.3 MPa (saturation 133.5 °C) with margin. */
export const WATER_MAX_TEMPERATURE_C = 130;
/** Lowest water temperature accepted [°C]: the lower bound of IF97 region 1 (273.15 K). */
export const WATER_MIN_TEMPERATURE_C = 0;

/**
 * Freezing point of the fluid [°C]: 0 for water, the Melinder (2010) polynomial for glycol solutions
 * (ENGINEERING.md 3.2). Example: ethylene glycol 30 % → −14.58 °C.
 */
export function freezingPoint_C(fluid: FluidSpec): number {
  if (fluid.kind === 'water') return 0;
  return freezingPointMelinder2010_C(fluid.kind, fluid.glycolMassFraction);
}

/**
 * Temperature range in which fluidProperties answers [°C]: water 0–130 °C (IF97 region 1 at 0.3 MPa);
 * glycols from the freezing point to 100 °C (Melinder's range). Example: water → { min: 0, max: 130 }.
 */
export function fluidTemperatureRange_C(fluid: FluidSpec): { min: number; max: number } {
  if (fluid.kind === 'water') return { min: WATER_MIN_TEMPERATURE_C, max: WATER_MAX_TEMPERATURE_C };
  return { min: freezingPoint_C(fluid), max: MELINDER_MAX_TEMPERATURE_C };
}

/**
 * Density, specific heat, viscosity, conductivity and Prandtl number of the tube-side fluid.
 * Water: IAPWS-IF97 region 1 (ρ, c_p), IAPWS 2008 viscosity, IAPWS 2011 conductivity at p = 0.3 MPa.
 * Glycols: Melinder (2010) polynomials. Pr = c_p μ / k.
 *
 * @param fluid kind and glycol mass fraction [-] (0 for water, 0–0.6 for glycols)
 * @param temperature_C bulk temperature [°C]; RangeError outside fluidTemperatureRange_C (message names the limit)
 * Example: water at 7 °C → ρ 1000.00052 kg/m³, c_p 4199.863 J/(kg K), μ 1.426806e−3 Pa s, k 0.572449 W/(m K),
 * Pr 10.46800 (ENGINEERING.md check W7).
 */
export function fluidProperties(fluid: FluidSpec, temperature_C: number): FluidProperties {
  const out: FluidProperties = { density_kg_m3: 0, specificHeat_J_kgK: 0, viscosity_Pa_s: 0, conductivity_W_mK: 0, prandtl: 0 };
  if (fluid.kind === 'water') {
    if (!(temperature_C >= WATER_MIN_TEMPERATURE_C)) {
      throw new RangeError(`water is valid from its freezing point ${WATER_MIN_TEMPERATURE_C} °C (got ${temperature_C} °C)`);
    }
    if (!(temperature_C <= WATER_MAX_TEMPERATURE_C)) {
      throw new RangeError(`water is valid up to ${WATER_MAX_TEMPERATURE_C} °C at 0.3 MPa (got ${temperature_C} °C)`);
    }
    waterPropertiesIapwsInto(temperature_C + 273.15, WATER_PRESSURE_PA, out);
  } else {
    glycolPropertiesMelinder2010Into(fluid.kind, fluid.glycolMassFraction, temperature_C, out);
  }
  out.prandtl = (out.specificHeat_J_kgK * out.viscosity_Pa_s) / out.conductivity_W_mK;
  return out;
}
