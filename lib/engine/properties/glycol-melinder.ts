// Ethylene- and propylene-glycol water solutions: Melinder (2010) polynomials with the coefficient set of
// ENGINEERING.md 3.2 (as carried by the CoolProp incompressible-fluid source, MEG and MPG).

export type GlycolKind = 'ethylene-glycol' | 'propylene-glycol';

/** Highest mass fraction the coefficient sets cover (libraries' limit, ENGINEERING.md 3.2). */
export const MELINDER_MAX_MASS_FRACTION = 0.6;
/** Highest temperature of the Melinder fits [°C]. */
export const MELINDER_MAX_TEMPERATURE_C = 100;

// Number of T-terms per x-power i = 0..5 (18 terms in all).
const N_T = [4, 4, 4, 3, 2, 1];

interface MelinderSet {
  xm: number; // mass-%
  tm: number; // °C
  rho: number[][];
  cp: number[][];
  k: number[][];
  lnMu: number[][];
  tFreeze: number[][];
}

const ETHYLENE: MelinderSet = {
  xm: 30.8462,
  tm: 31.728,
  rho: [
    [1034, -0.4781, -0.002692, 4.725e-6],
    [1.311, -0.006876, 4.805e-5, 1.69e-8],
    [7.49e-5, 7.855e-5, -3.995e-7, 4.982e-9],
    [-1.062e-4, 1.229e-6, -1.153e-8],
    [-9.623e-7, -7.221e-8],
    [4.891e-8],
  ],
  cp: [
    [3737, 2.93, -0.004675, -1.389e-5],
    [-17.99, 0.1046, -4.147e-4, 1.847e-7],
    [-0.09933, 3.516e-4, 5.109e-6, -7.138e-8],
    [0.00261, -1.189e-6, -1.643e-7],
    [1.537e-5, -4.272e-7],
    [-1.618e-6],
  ],
  k: [
    [0.472, 8.903e-4, -1.058e-6, -2.789e-9],
    [-0.004286, -1.473e-5, 1.059e-7, -1.142e-10],
    [1.747e-5, 6.814e-8, -3.612e-9, 2.365e-12],
    [3.017e-8, -2.412e-9, 4.004e-11],
    [-1.322e-9, 2.555e-11],
    [2.678e-11],
  ],
  lnMu: [
    [0.4705, -0.0255, 1.782e-4, -7.669e-7],
    [0.02471, -1.171e-4, 1.052e-6, -1.634e-8],
    [3.328e-6, 1.086e-6, 1.051e-8, -6.475e-10],
    [1.659e-6, 3.157e-9, 4.063e-10],
    [3.089e-8, 1.831e-10],
    [-1.865e-9],
  ],
  tFreeze: [
    [-15.25, -1.566e-6, -2.278e-7, 2.169e-9],
    [-0.808, -1.339e-6, 2.047e-8, -2.717e-11],
    [-0.01334, 6.332e-8, 2.373e-10, -2.183e-12],
    [-7.293e-5, -1.764e-9, -2.442e-11],
    [1.006e-6, -7.662e-11],
    [1.14e-9],
  ],
};

const PROPYLENE: MelinderSet = {
  xm: 30.7031,
  tm: 32.7083,
  rho: [
    [1018, -0.5406, -0.002666, 1.347e-5],
    [0.7604, -0.00945, 5.541e-5, -1.343e-7],
    [-0.002498, 2.7e-5, -4.018e-7, 3.376e-9],
    [-1.55e-4, 2.829e-6, -7.175e-9],
    [-1.131e-6, -2.221e-8],
    [2.342e-8],
  ],
  cp: [
    [3882, 2.699, -0.001659, -1.032e-5],
    [-13.04, 0.0507, -4.752e-5, 1.522e-6],
    [-0.1598, 9.534e-5, 1.167e-5, -4.87e-8],
    [3.539e-4, 3.102e-5, -2.95e-7],
    [5e-5, -7.135e-7],
    [-4.959e-7],
  ],
  k: [
    [0.4513, 7.955e-4, 3.482e-8, -5.966e-9],
    [-0.004795, -1.678e-5, 8.941e-8, 1.493e-10],
    [2.076e-5, 1.563e-7, -4.615e-9, 9.897e-12],
    [-9.083e-8, -2.518e-9, 6.543e-11],
    [-5.952e-10, -3.605e-11],
    [2.104e-11],
  ],
  lnMu: [
    [0.6837, -0.03045, 2.525e-4, -1.399e-6],
    [0.03328, -3.984e-4, 4.332e-6, -1.86e-8],
    [5.453e-5, -8.6e-8, -1.593e-8, -4.465e-11],
    [-3.9e-6, 1.054e-7, -1.589e-9],
    [-1.587e-8, 4.475e-10],
    [3.564e-9],
  ],
  tFreeze: [
    [-13.25, -3.82e-5, 7.865e-7, -1.733e-9],
    [-0.6631, 6.774e-6, -6.242e-8, -7.819e-10],
    [-0.01094, 5.332e-8, -4.169e-9, 3.288e-11],
    [-2.283e-4, -1.131e-8, 1.918e-10],
    [-3.409e-6, 8.035e-11],
    [1.465e-8],
  ],
};

function setFor(kind: GlycolKind): MelinderSet {
  return kind === 'ethylene-glycol' ? ETHYLENE : PROPYLENE;
}

// Scratch power tables reused by every call (single-threaded JS: no allocation in the hot path).
const xPow = new Float64Array(6);
const tPow = new Float64Array(4);

function fillScratch(set: MelinderSet, percent: number, temperature_C: number): void {
  const dx = percent - set.xm;
  const dt = temperature_C - set.tm;
  xPow[0] = 1;
  for (let i = 1; i < 6; i++) xPow[i] = xPow[i - 1] * dx;
  tPow[0] = 1;
  for (let j = 1; j < 4; j++) tPow[j] = tPow[j - 1] * dt;
}

function evaluate(c: number[][]): number {
  let sum = 0;
  for (let i = 0; i < 6; i++) {
    const row = c[i];
    let inner = 0;
    for (let j = 0; j < N_T[i]; j++) inner += row[j] * tPow[j];
    sum += inner * xPow[i];
  }
  return sum;
}

function checkFraction(massFraction: number): void {
  if (!(massFraction >= 0 && massFraction <= MELINDER_MAX_MASS_FRACTION)) {
    throw new RangeError(`glycol mass fraction must be 0 to ${MELINDER_MAX_MASS_FRACTION} (got ${massFraction})`);
  }
}

/**
 * Freezing point of a glycol solution, Melinder (2010) T_f polynomial (ENGINEERING.md 3.2, coefficient set of
 * the CoolProp MEG/MPG sources). f(x, T) = Σ c_ij (x − x_m)^i (T − T_m)^j with x in mass-%; the T-terms are
 * negligible and are evaluated at T = T_m.
 *
 * @param kind ethylene or propylene glycol
 * @param massFraction glycol mass fraction [-], 0 to 0.6
 * @returns freezing point [°C]
 * Example: ethylene glycol, 0.30 → −14.58 °C.
 */
export function freezingPointMelinder2010_C(kind: GlycolKind, massFraction: number): number {
  checkFraction(massFraction);
  const set = setFor(kind);
  fillScratch(set, massFraction * 100, set.tm);
  return evaluate(set.tFreeze);
}

/** Properties of a glycol solution at one temperature (SI). */
export interface GlycolProperties {
  density_kg_m3: number;
  specificHeat_J_kgK: number;
  conductivity_W_mK: number;
  viscosity_Pa_s: number;
}

/**
 * Density, specific heat, conductivity and viscosity of an ethylene- or propylene-glycol solution, Melinder (2010)
 * polynomials (ENGINEERING.md 3.2): f(x, T) = Σ_{i=0..5} Σ_{j<nT_i} c_ij (x − x_m)^i (T − T_m)^j, nT = [4,4,4,3,2,1],
 * x in mass-%, T in °C; viscosity from f = ln(μ / mPa s).
 *
 * @param kind ethylene or propylene glycol
 * @param massFraction glycol mass fraction [-], 0 to 0.6
 * @param temperature_C T [°C], freezing point ≤ T ≤ 100 °C
 * Example: ethylene glycol 0.30 at 20 °C → ρ 1038.0455 kg/m³, c_p 3718.251 J/(kg K), k 0.464897 W/(m K),
 * μ 2.166449 mPa s.
 */
export function glycolPropertiesMelinder2010(kind: GlycolKind, massFraction: number, temperature_C: number): GlycolProperties {
  return glycolPropertiesMelinder2010Into(kind, massFraction, temperature_C, {
    density_kg_m3: 0,
    specificHeat_J_kgK: 0,
    conductivity_W_mK: 0,
    viscosity_Pa_s: 0,
  });
}

/** Same as {@link glycolPropertiesMelinder2010}, written into `out` (no allocation; for the solver's hot path). */
export function glycolPropertiesMelinder2010Into<T extends GlycolProperties>(
  kind: GlycolKind,
  massFraction: number,
  temperature_C: number,
  out: T,
): T {
  const tf = freezingPointMelinder2010_C(kind, massFraction);
  if (!(temperature_C >= tf)) {
    throw new RangeError(
      `${kind} at ${(massFraction * 100).toFixed(0)} % is valid only above its freezing point ${tf.toFixed(1)} °C (got ${temperature_C} °C)`,
    );
  }
  if (!(temperature_C <= MELINDER_MAX_TEMPERATURE_C)) {
    throw new RangeError(`glycol properties are valid up to ${MELINDER_MAX_TEMPERATURE_C} °C (got ${temperature_C} °C)`);
  }
  const set = setFor(kind);
  fillScratch(set, massFraction * 100, temperature_C);
  out.density_kg_m3 = evaluate(set.rho);
  out.specificHeat_J_kgK = evaluate(set.cp);
  out.conductivity_W_mK = evaluate(set.k);
  out.viscosity_Pa_s = 1e-3 * Math.exp(evaluate(set.lnMu));
  return out;
}
