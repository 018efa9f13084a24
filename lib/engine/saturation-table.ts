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
  const hermite = (y: Float64Array, dy: Float64Array, t: number): number => {
    let i = Math.floor((t - t0) / step);
    if (i >= n - 1) i = n - 2;
    const s = (t - (t0 + i * step)) / step;
    const s2 = s * s;
    const s3 = s2 * s;
    return (
      (2 * s3 - 3 * s2 + 1) * y[i] + (s3 - 2 * s2 + s) * step * dy[i] + (-2 * s3 + 3 * s2) * y[i + 1] + (s3 - s2) * step * dy[i + 1]
    );
  };
  const inTable = (t: number) => t >= t0 && t <= tEnd;
  const enthalpy = (t: number): number => (inTable(t) ? hermite(h, dh, t) : saturationEnthalpy_J_kg(t, pressure_Pa));
  const slope = (t: number): number => {
    let i = Math.floor((t - t0) / step);
    if (i >= n - 1) i = n - 2;
    const s = (t - (t0 + i * step)) / step;
    const s2 = s * s;
    return (
      ((6 * s2 - 6 * s) * h[i]) / step + (3 * s2 - 4 * s + 1) * dh[i] + ((-6 * s2 + 6 * s) * h[i + 1]) / step + (3 * s2 - 2 * s) * dh[i + 1]
    );
  };
  return {
    enthalpy_J_kg: enthalpy,
    humidityRatio: (t) => (inTable(t) ? hermite(ws, dws, t) : wsAt(t)),
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
        const f = hermite(h, dh, t) - target;
        const next = t - f / slope(t);
        t = next < lo ? lo : next > hi ? hi : next;
        if (Math.abs(f) < 1e-10 * Math.abs(target) + 1e-9) break;
      }
      return t;
    },
  };
}
