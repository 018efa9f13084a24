/**
 * Exact unit definitions (NIST Special Publication 811, 2008 edition, Appendix B). Every IP factor below is
 * exact by definition except the IT Btu per hour, which is the quotient of two exact numbers.
 */

/** 1 in = 0.0254 m exactly. */
export const INCH_m = 0.0254;
/** 1 ft = 0.3048 m exactly. */
export const FOOT_m = 0.3048;
/** 1 US liquid gallon = 231 in3 = 3.785411784 L exactly. */
export const US_GALLON_m3 = 3.785411784e-3;
/** 1 lb (avoirdupois) = 0.45359237 kg exactly. */
export const POUND_kg = 0.45359237;
/** 1 grain = 1/7000 lb. */
export const GRAIN_kg = POUND_kg / 7000;
/** 1 Btu (International Table) = 1055.05585262 J exactly. */
export const BTU_IT_J = 1055.05585262;
/** 1 Btu_IT/h = 0.29307107... W. */
export const BTU_PER_HOUR_W = BTU_IT_J / 3600;
/** Standard acceleration of gravity 9.80665 m/s2 (exact, conventional). */
export const STANDARD_GRAVITY_m_s2 = 9.80665;
/** Conventional water column density 1000 kg/m3 (NIST SP 811: "conventional" inch and foot of water). */
const WATER_COLUMN_kg_m3 = 1000;
/** Conventional inch of water = 249.0889 Pa. */
export const INCH_OF_WATER_Pa = WATER_COLUMN_kg_m3 * STANDARD_GRAVITY_m_s2 * INCH_m;
/** Conventional foot of water = 2989.067 Pa. */
export const FOOT_OF_WATER_Pa = WATER_COLUMN_kg_m3 * STANDARD_GRAVITY_m_s2 * FOOT_m;
/** Pound-force per square inch = 6894.757 Pa. */
export const PSI_Pa = (POUND_kg * STANDARD_GRAVITY_m_s2) / (INCH_m * INCH_m);

export const celsiusToFahrenheit = (c: number): number => c * 1.8 + 32;
export const fahrenheitToCelsius = (f: number): number => (f - 32) / 1.8;
