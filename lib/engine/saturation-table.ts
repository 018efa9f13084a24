/**
 * A tabulated saturation curve for the segment sweep. The wet segments need h_s(T), its inverse and W_s(T) a few
 * times per segment per sweep; evaluating the ASHRAE equations (psychrometrics.ts) each time, with a bisection for
 * the inverse, would dominate the solve. This table samples psychrometrics.ts once per solve at the coil's pressure
 * on a 0.1 K grid and interpolates with cubic Hermite polynomials (slopes from the same functions by central
 * differences); outside the tabulated span it calls psychrometrics.ts directly. Interpolation error is below
 * 1e−8 relative on h_s over 0–60 °C (tested against the direct functions).
 */
import {
  saturationEnthalpy_J_kg,
  saturationTemperatureFromEnthalpy_C,
  saturationVapourPressure_Pa,
} from '@/lib/engine/psychrometrics';
import type { SaturationCurve } from '@/lib/engine/thermal-sweep';

/** Grid step of the table, K. */
export const SATURATION_TABLE_STEP_K = 0.1;
const HUMIDITY_RATIO_FACTOR = 0.621945;

/** Build a tabulated saturation curve at `pressure_Pa` over [lo_C, hi_C] (widened by 1 K each side). */
export function tabulatedSaturationCurve(pressure_Pa: number, lo_C: number, hi_C: number): SaturationCurve {
  const step = SATURATION_TABLE_STEP_K;
  const t0 = Math.floor((lo_C - 1) / step) * step;
  const n = Math.max(2, Math.ceil((hi_C + 1 - t0) / step) + 1);
  const tEnd = t0 + (n - 1) * step;
  const h = new Float64Array(n);
  const dh = new Float64Array(n);
  const ws = new Float64Array(n);
  const dws = new Float64Array(n);
  const wsAt = (t: number) => {
    const pw = saturationVapourPressure_Pa(t);
    return (HUMIDITY_RATIO_FACTOR * pw) / (pressure_Pa - pw);
  };
  const d = 1e-3;
  for (let i = 0; i < n; i++) {
    const t = t0 + i * step;
    h[i] = saturationEnthalpy_J_kg(t, pressure_Pa);
    dh[i] = (saturationEnthalpy_J_kg(t + d, pressure_Pa) - saturationEnthalpy_J_kg(t - d, pressure_Pa)) / (2 * d);
    ws[i] = wsAt(t);
    dws[i] = (wsAt(t + d) - wsAt(t - d)) / (2 * d);
  }
  // Each cell's cubic Hermite polynomial in s = (t − t_i)/step, stored as Horner coefficients c0 + s(c1 + s(c2 + s c3)).
  const cubic = (y: Float64Array, dy: Float64Array): Float64Array => {
    const c = new Float64Array(4 * (n - 1));
    for (let i = 0; i < n - 1; i++) {
      const y0 = y[i];
      const y1 = y[i + 1];
      const m0 = step * dy[i];
      const m1 = step * dy[i + 1];
      c[4 * i] = y0;
      c[4 * i + 1] = m0;
      c[4 * i + 2] = 3 * (y1 - y0) - 2 * m0 - m1;
      c[4 * i + 3] = 2 * (y0 - y1) + m0 + m1;
    }
    return c;
  };
  const hCoef = cubic(h, dh);
  const wCoef = cubic(ws, dws);
  const invStep = 1 / step;
  const evaluate = (c: Float64Array, t: number): number => {
    const x = (t - t0) * invStep;
    let i = Math.floor(x);
    if (i > n - 2) i = n - 2;
    const sv = x - i;
    const k = 4 * i;
    return c[k] + sv * (c[k + 1] + sv * (c[k + 2] + sv * c[k + 3]));
  };
  const inTable = (t: number) => t >= t0 && t <= tEnd;
  const enthalpy = (t: number): number => (inTable(t) ? evaluate(hCoef, t) : saturationEnthalpy_J_kg(t, pressure_Pa));
  /** dh_s/dT of the interpolant, J/(kg K). */
  const slope = (t: number): number => {
    const x = (t - t0) * invStep;
    let i = Math.floor(x);
    if (i > n - 2) i = n - 2;
    const sv = x - i;
    const k = 4 * i;
    return (hCoef[k + 1] + sv * (2 * hCoef[k + 2] + 3 * sv * hCoef[k + 3])) * invStep;
  };
  return {
    enthalpy_J_kg: enthalpy,
    humidityRatio: (t) => (inTable(t) ? evaluate(wCoef, t) : wsAt(t)),
    temperatureFromEnthalpy_C: (target, near) => {
      if (!(target >= h[0] && target <= h[n - 1])) return saturationTemperatureFromEnthalpy_C(target, pressure_Pa);
      // Warm start: Newton from a nearby temperature (the previous sweep's), kept inside the table.
      if (near !== undefined && near >= t0 && near <= tEnd) {
        let t = near;
        for (let k = 0; k < 6; k++) {
          const f = enthalpy(t) - target;
          if (Math.abs(f) < 1e-10 * Math.abs(target) + 1e-9) return t;
          t -= f / slope(t);
          if (!(t >= t0 && t <= tEnd)) break;
        }
      }
      // Bracket on the grid (binary search), then Newton on the interpolant inside the cell.
      let a = 0;
      let b = n - 1;
      while (b - a > 1) {
        const m = (a + b) >> 1;
        if (h[m] <= target) a = m;
        else b = m;
      }
      const lo = t0 + a * step;
      const hi = lo + step;
      let t = lo + (step * (target - h[a])) / (h[b] - h[a]);
      for (let k = 0; k < 8; k++) {
        const f = evaluate(hCoef, t) - target;
        const next = t - f / slope(t);
        t = next < lo ? lo : next > hi ? hi : next;
        if (Math.abs(f) < 1e-10 * Math.abs(target) + 1e-9) break;
      }
      return t;
    },
  };
}
