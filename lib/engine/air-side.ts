// Air-side Colburn j and Fanning f of staggered plate-fin tube banks and the core pressure drop
// (ENGINEERING.md 3.7, v1 decision 8: compute outside the ranges and warn, naming the input and the range).

/** Colburn and Fanning factors plus the warnings the user must see. */
export interface ColburnFriction {
  j: number;
  f: number;
  warnings: string[];
}

/** Geometry and flow of a plain-fin staggered bank (all lengths in m). */
export interface PlainFinInput {
  /** Re based on the collar diameter and the core mass velocity, Re_Dc = G_c D_c / μ [-]. */
  reynoldsDc: number;
  /** Rows in the air direction N [-], integer ≥ 1. */
  rows: number;
  collarDiameter_m: number;
  hydraulicDiameter_m: number;
  transversePitch_m: number;
  rowPitch_m: number;
  finPitch_m: number;
}

/** Highest row count inside the Wang correlations; deeper coils use N = 6 with a warning (v1 decision 8). */
export const WANG_MAX_ROWS = 6;

function checkPositive(name: string, value: number): void {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${name} must be positive and finite (got ${value})`);
}

function checkRows(rows: number): void {
  if (!(Number.isInteger(rows) && rows >= 1)) throw new RangeError(`rows must be an integer ≥ 1 (got ${rows})`);
}

/** Pushes a warning when value lies outside [lo, hi]; scale converts to the display unit. */
function warnRange(warnings: string[], source: string, name: string, value: number, lo: number, hi: number, unit: string, scale = 1): void {
  const v = value * scale;
  // Small slack so that the range ends written with 3–4 digits do not warn on their own rounding.
  if (v < lo * (1 - 1e-3) || v > hi * (1 + 1e-3)) {
    const fmt = (x: number): string => String(Number(x.toPrecision(4)));
    warnings.push(`${source}: ${name} ${fmt(v)}${unit} is outside the correlation's range ${fmt(lo)}–${fmt(hi)}${unit} (extrapolated)`);
  }
}

/** Clamps the row count at 6 with the v1 "extrapolated" warning. */
function rowsForCorrelation(rows: number, source: string, warnings: string[]): number {
  if (rows > WANG_MAX_ROWS) {
    warnings.push(`${source}: ${rows} rows is beyond the correlation's 1–6 rows; computed with 6 rows (extrapolated)`);
    return WANG_MAX_ROWS;
  }
  return rows;
}

const WANG_2000 = 'Wang, Chi & Chang (2000) plain fin';

/**
 * Plain-fin staggered bank j and Fanning f, Wang, Chi & Chang (2000), IJHMT 43:2693–2700, as transcribed in
 * Shah & Sekulić (2003) §7.5.4.2 (ENGINEERING.md 3.7):
 *  N = 1: j = 0.108 Re^−0.29 (P_t/P_l)^P1 (F_p/D_c)^−1.084 (F_p/D_h)^−0.786 (F_p/P_t)^P2,
 *         P1 = 1.9 − 0.23 ln Re, P2 = −0.236 + 0.126 ln Re;
 *  N ≥ 2: j = 0.086 Re^P3 N^P4 (F_p/D_c)^P5 (F_p/D_h)^P6 (F_p/P_t)^−0.93,
 *         P3 = −0.361 − 0.042 N/ln Re + 0.158 ln[N (F_p/D_c)^0.41], P4 = −1.224 − 0.076 (P_l/D_h)^1.42/ln Re,
 *         P5 = −0.083 + 0.058 N/ln Re, P6 = −5.735 + 1.21 ln(Re/N);
 *  f = 0.0267 Re^F1 (P_t/P_l)^F2 (F_p/D_c)^F3, F1 = −0.764 + 0.739 P_t/P_l + 0.177 F_p/D_c − 0.00758/N,
 *      F2 = −15.689 + 64.021/ln Re, F3 = 1.696 − 15.695/ln Re.
 * Validity (warned, not refused): Re_Dc 300–20 000, D_c 6.9–13.6 mm, D_h 1.30–9.37 mm, P_t 20.4–31.8 mm,
 * P_l 12.7–32 mm, F_p 1.0–8.7 mm, N 1–6 (N > 6 → N = 6, "extrapolated").
 * Example: Re 3000, 4 rows, D_c 13.0, D_h 3.123, P_t 31.75, P_l 27.5, F_p 2.54 mm → j 0.0098169, f 0.0361143.
 */
export function colburnAndFrictionWangChiChang2000(input: PlainFinInput): ColburnFriction {
  const { reynoldsDc: re, collarDiameter_m: dc, hydraulicDiameter_m: dh, transversePitch_m: pt, rowPitch_m: pl, finPitch_m: fp } = input;
  checkPositive('Re_Dc', re);
  if (re <= 1) throw new RangeError(`Re_Dc must exceed 1 (got ${re}): the correlation divides by ln Re`);
  checkRows(input.rows);
  checkPositive('collar diameter', dc);
  checkPositive('hydraulic diameter', dh);
  checkPositive('transverse pitch', pt);
  checkPositive('row pitch', pl);
  checkPositive('fin pitch', fp);
  if (pt <= dc) throw new RangeError(`transverse pitch ${pt} m must exceed the collar diameter ${dc} m`);

  const warnings: string[] = [];
  const n = rowsForCorrelation(input.rows, WANG_2000, warnings);
  warnRange(warnings, WANG_2000, 'Re_Dc', re, 300, 20000, '');
  warnRange(warnings, WANG_2000, 'collar diameter', dc, 6.9, 13.6, ' mm', 1000);
  warnRange(warnings, WANG_2000, 'hydraulic diameter', dh, 1.3, 9.37, ' mm', 1000);
  warnRange(warnings, WANG_2000, 'transverse pitch', pt, 20.4, 31.8, ' mm', 1000);
  warnRange(warnings, WANG_2000, 'row pitch', pl, 12.7, 32, ' mm', 1000);
  warnRange(warnings, WANG_2000, 'fin pitch', fp, 1.0, 8.7, ' mm', 1000);

  const lnRe = Math.log(re);
  let j: number;
  if (n === 1) {
    const p1 = 1.9 - 0.23 * lnRe;
    const p2 = -0.236 + 0.126 * lnRe;
    j = 0.108 * Math.pow(re, -0.29) * Math.pow(pt / pl, p1) * Math.pow(fp / dc, -1.084) * Math.pow(fp / dh, -0.786) * Math.pow(fp / pt, p2);
  } else {
    const p3 = -0.361 - (0.042 * n) / lnRe + 0.158 * Math.log(n * Math.pow(fp / dc, 0.41));
    const p4 = -1.224 - (0.076 * Math.pow(pl / dh, 1.42)) / lnRe;
    const p5 = -0.083 + (0.058 * n) / lnRe;
    const p6 = -5.735 + 1.21 * Math.log(re / n);
    j = 0.086 * Math.pow(re, p3) * Math.pow(n, p4) * Math.pow(fp / dc, p5) * Math.pow(fp / dh, p6) * Math.pow(fp / pt, -0.93);
  }
  const f1 = -0.764 + (0.739 * pt) / pl + (0.177 * fp) / dc - 0.00758 / n;
  const f2 = -15.689 + 64.021 / lnRe;
  const f3 = 1.696 - 15.695 / lnRe;
  const f = 0.0267 * Math.pow(re, f1) * Math.pow(pt / pl, f2) * Math.pow(fp / dc, f3);
  return { j, f, warnings };
}

/** Geometry of a herringbone (wavy) fin bank: the plain-fin inputs plus the corrugation. */
export interface HerringboneFinInput extends PlainFinInput {
  finThickness_m: number;
  /** Corrugation depth p_d, peak to valley, excluding the fin thickness [m]. */
  corrugationDepth_m: number;
  /** Projected half-wavelength x_f [m]. */
  halfWavelength_m: number;
  /** Total air-side area over bare-tube area A_o/A_pt [-], > 1. */
  areaRatioToBareTube: number;
  /** Which of the two published sets to use; by default 'large' for D_c ≥ 12 mm, else 'small'. */
  tubeSet?: 'large' | 'small';
}

const WANG_2002 = 'Wang, Hwang & Lin (2002) herringbone fin';
const HERRINGBONE_UNVERIFIED =
  `${WANG_2002}: unverified correlation (equations not checked against the original paper; a plausibility check failed for the large-tube set)`;

/**
 * Herringbone (wavy) fin j and Fanning f, Wang, Hwang & Lin (2002), Int. J. Refrig. 25:673–680, as transcribed in
 * Shah & Sekulić (2003) §7.5.4.3 (ENGINEERING.md 3.7). tan θ = p_d/x_f.
 *  Large tubes: j = 1.7910 Re^J1 (P_l/δ_f)^−0.456 N^−0.27 (F_p/D_c)^−1.343 (p_d/x_f)^0.317,
 *    J1 = −0.1707 − 1.374 (P_l/δ_f)^−0.493 (F_p/D_c)^−0.886 N^−0.134 (p_d/x_f)^−0.0296;
 *    f = 0.05273 Re^F2 (p_d/x_f)^F3 (F_p/P_t)^F4 [ln(A_o/A_pt)]^−2.726 (D_h/D_c)^0.1325 N^0.02305,
 *    F2 = 0.1714 − 0.07372 (F_p/P_l)^0.25 ln(A_o/A_pt) (p_d/x_f)^−0.2, F3 = 0.426 (F_p/P_t)^0.3 ln(A_o/A_pt),
 *    F4 = −10.2192/ln Re.
 *  Small tubes: j = 0.324 Re^J1 (F_p/P_l)^J2 (tan θ)^J3 (P_l/P_t)^J4 N^0.428,
 *    J1 = −0.229 + 0.115 (F_p/D_c)^0.6 (P_l/D_h)^0.54 N^−0.284 ln(0.5 tan θ), J2 = −0.251 + 0.232 N^1.37/(ln Re − 2.303),
 *    J3 = −0.439 (F_p/D_h)^0.09 (P_l/P_t)^−1.75 N^−0.93, J4 = 0.502 (ln Re − 2.54);
 *    f = 0.01915 Re^F1 (tan θ)^F2 (F_p/P_l)^F3 [ln(A_o/A_pt)]^−5.35 (D_h/D_c)^1.3796 N^−0.0916,
 *    F1 = 0.4604 − 0.01336 (F_p/P_l)^0.58 ln(A_o/A_pt) (tan θ)^−1.5, F2 = 3.247 (F_p/P_t)^1.4 ln(A_o/A_pt),
 *    F3 = −20.113/ln Re.
 * Validity (warned): large D_c 13.6–16.85 mm, P_t 31.75–38.1 mm, P_l 27.5–33 mm, F_p 2.98–6.34 mm,
 * x_f 6.87–8.25 mm, θ 12.3–14.7°, Re 500–10 000; small D_c 8.58–10.38 mm, P_t 25.4 mm, P_l 19.05–25.04 mm,
 * F_p 1.21–3.66 mm, θ 14.5–18.5°, Re 300–8000; N 1–6 for both. The result always carries an "unverified" warning
 * (ENGINEERING.md 3.7 caution).
 * Example: large set, Re 3000, 4 rows, D_c 16.18, D_h 3.0, P_t 38.1, P_l 33.0, F_p 3.175, δ_f 0.15, p_d 1.8,
 * x_f 7.5 mm, A_o/A_pt 18 → j 0.0090299, f 0.0278467 (independent evaluation of the formulas, see the test).
 */
export function colburnAndFrictionWangHwangLin2002Herringbone(input: HerringboneFinInput): ColburnFriction {
  const { reynoldsDc: re, collarDiameter_m: dc, hydraulicDiameter_m: dh, transversePitch_m: pt, rowPitch_m: pl, finPitch_m: fp } = input;
  checkPositive('Re_Dc', re);
  if (re <= 20) throw new RangeError(`Re_Dc must exceed 20 (got ${re}): the correlation divides by ln Re − 2.303`);
  checkRows(input.rows);
  checkPositive('collar diameter', dc);
  checkPositive('hydraulic diameter', dh);
  checkPositive('transverse pitch', pt);
  checkPositive('row pitch', pl);
  checkPositive('fin pitch', fp);
  checkPositive('fin thickness', input.finThickness_m);
  checkPositive('corrugation depth', input.corrugationDepth_m);
  checkPositive('half-wavelength', input.halfWavelength_m);
  if (!(input.areaRatioToBareTube > 1)) throw new RangeError(`A_o/A_pt must exceed 1 (got ${input.areaRatioToBareTube})`);

  const warnings: string[] = [HERRINGBONE_UNVERIFIED];
  const n = rowsForCorrelation(input.rows, WANG_2002, warnings);
  const set = input.tubeSet ?? (dc >= 0.012 ? 'large' : 'small');
  const tanTheta = input.corrugationDepth_m / input.halfWavelength_m;
  const thetaDeg = (Math.atan(tanTheta) * 180) / Math.PI;
  const lnRe = Math.log(re);
  const lnA = Math.log(input.areaRatioToBareTube);
  let j: number;
  let f: number;
  if (set === 'large') {
    const src = `${WANG_2002} (large tubes)`;
    warnRange(warnings, src, 'Re_Dc', re, 500, 10000, '');
    warnRange(warnings, src, 'collar diameter', dc, 13.6, 16.85, ' mm', 1000);
    warnRange(warnings, src, 'transverse pitch', pt, 31.75, 38.1, ' mm', 1000);
    warnRange(warnings, src, 'row pitch', pl, 27.5, 33, ' mm', 1000);
    warnRange(warnings, src, 'fin pitch', fp, 2.98, 6.34, ' mm', 1000);
    warnRange(warnings, src, 'half-wavelength', input.halfWavelength_m, 6.87, 8.25, ' mm', 1000);
    warnRange(warnings, src, 'corrugation angle', thetaDeg, 12.3, 14.7, '°');
    const pld = pl / input.finThickness_m;
    const j1 = -0.1707 - 1.374 * Math.pow(pld, -0.493) * Math.pow(fp / dc, -0.886) * Math.pow(n, -0.134) * Math.pow(tanTheta, -0.0296);
    j = 1.791 * Math.pow(re, j1) * Math.pow(pld, -0.456) * Math.pow(n, -0.27) * Math.pow(fp / dc, -1.343) * Math.pow(tanTheta, 0.317);
    const f2 = 0.1714 - 0.07372 * Math.pow(fp / pl, 0.25) * lnA * Math.pow(tanTheta, -0.2);
    const f3 = 0.426 * Math.pow(fp / pt, 0.3) * lnA;
    const f4 = -10.2192 / lnRe;
    f = 0.05273 * Math.pow(re, f2) * Math.pow(tanTheta, f3) * Math.pow(fp / pt, f4) * Math.pow(lnA, -2.726) * Math.pow(dh / dc, 0.1325) * Math.pow(n, 0.02305);
  } else {
    const src = `${WANG_2002} (small tubes)`;
    warnRange(warnings, src, 'Re_Dc', re, 300, 8000, '');
    warnRange(warnings, src, 'collar diameter', dc, 8.58, 10.38, ' mm', 1000);
    warnRange(warnings, src, 'transverse pitch', pt, 25.4, 25.4, ' mm', 1000);
    warnRange(warnings, src, 'row pitch', pl, 19.05, 25.04, ' mm', 1000);
    warnRange(warnings, src, 'fin pitch', fp, 1.21, 3.66, ' mm', 1000);
    warnRange(warnings, src, 'corrugation angle', thetaDeg, 14.5, 18.5, '°');
    const j1 = -0.229 + 0.115 * Math.pow(fp / dc, 0.6) * Math.pow(pl / dh, 0.54) * Math.pow(n, -0.284) * Math.log(0.5 * tanTheta);
    const j2 = -0.251 + (0.232 * Math.pow(n, 1.37)) / (lnRe - 2.303);
    const j3 = -0.439 * Math.pow(fp / dh, 0.09) * Math.pow(pl / pt, -1.75) * Math.pow(n, -0.93);
    const j4 = 0.502 * (lnRe - 2.54);
    j = 0.324 * Math.pow(re, j1) * Math.pow(fp / pl, j2) * Math.pow(tanTheta, j3) * Math.pow(pl / pt, j4) * Math.pow(n, 0.428);
    const f1 = 0.4604 - 0.01336 * Math.pow(fp / pl, 0.58) * lnA * Math.pow(tanTheta, -1.5);
    const f2 = 3.247 * Math.pow(fp / pt, 1.4) * lnA;
    const f3 = -20.113 / lnRe;
    f = 0.01915 * Math.pow(re, f1) * Math.pow(tanTheta, f2) * Math.pow(fp / pl, f3) * Math.pow(lnA, -5.35) * Math.pow(dh / dc, 1.3796) * Math.pow(n, -0.0916);
  }
  return { j, f, warnings };
}

/** Inputs of the core pressure-drop equation. */
export interface KaysLondonInput {
  /** Core mass velocity G_c = ṁ/A_c [kg/(m² s)]. */
  massVelocity: number;
  densityIn: number;
  densityOut: number;
  /** Free-flow to frontal area ratio σ [-], 0–1. */
  sigma: number;
  /** Fanning friction factor [-]. */
  f: number;
  /** Total air-side area over minimum free-flow area A_o/A_c [-]. */
  areaRatioAoAc: number;
}

/**
 * Air pressure drop across a plate-fin core, Kays & London (1984) core equation as used by Wang et al. for data
 * reduction (ENGINEERING.md 3.7; entrance/exit losses are inside Wang's f):
 * ΔP = (G_c²/(2ρ_in)) [(1 + σ²)(ρ_in/ρ_out − 1) + f (A_o/A_c)(ρ_in/ρ_m)], 1/ρ_m = (1/ρ_in + 1/ρ_out)/2.
 * @returns ΔP [Pa]
 * Example: G_c 5.32819, ρ 1.1843 in and out, σ 0.55568, f 0.0329651, A_o/A_c 140.889 → 55.667 Pa.
 */
export function airPressureDropKaysLondon(input: KaysLondonInput): number {
  const { massVelocity: g, densityIn: ri, densityOut: ro, sigma, f, areaRatioAoAc } = input;
  if (!(g >= 0)) throw new RangeError(`mass velocity must be ≥ 0 (got ${g})`);
  checkPositive('inlet density', ri);
  checkPositive('outlet density', ro);
  if (!(sigma > 0 && sigma <= 1)) throw new RangeError(`σ must be within (0, 1] (got ${sigma})`);
  checkPositive('friction factor', f);
  checkPositive('A_o/A_c', areaRatioAoAc);
  const rhoMeanInv = 0.5 * (1 / ri + 1 / ro);
  return ((g * g) / (2 * ri)) * ((1 + sigma * sigma) * (ri / ro - 1) + f * areaRatioAoAc * ri * rhoMeanInv);
}
