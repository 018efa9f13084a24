// ε-NTU relations (ENGINEERING.md 3.10): classic single-exchanger forms, the per-tube segment formula and the
// closed forms for N-row serpentine counter-crossflow coils (effectiveness on the AIR side, corrected 4-row ξ).
// Sources: Incropera & DeWitt table 11.3; Shah & Sekulić (2003); `ht` library; Triboix (2009); Schedwill (1968) /
// Nicole (1972) as reproduced by Thulukkanam (2013).

function checkNtu(ntu: number): void {
  if (!(ntu >= 0) || !Number.isFinite(ntu)) throw new RangeError(`NTU must be ≥ 0 and finite (got ${ntu})`);
}

function checkCr(cr: number): void {
  if (!(cr >= 0 && cr <= 1)) throw new RangeError(`capacity ratio C_min/C_max must be within [0, 1] (got ${cr})`);
}

/** Below this |1 − C_r| the C_r = 1 limits are used. */
const CR_ONE_TOL = 1e-9;

/**
 * Counterflow effectiveness (Incropera table 11.3): ε = [1 − e^{−NTU(1−C_r)}]/[1 − C_r e^{−NTU(1−C_r)}];
 * C_r = 1: ε = NTU/(1 + NTU).
 * @param ntu NTU = UA/C_min [-], ≥ 0
 * @param cr C_r = C_min/C_max [-], 0–1
 * Example: NTU 5, C_r 0.7 → 0.920670368605 (`ht` docstring).
 */
export function effectivenessCounterflow(ntu: number, cr: number): number {
  checkNtu(ntu);
  checkCr(cr);
  if (Math.abs(1 - cr) < CR_ONE_TOL) return ntu / (1 + ntu);
  const e = Math.exp(-ntu * (1 - cr));
  return (1 - e) / (1 - cr * e);
}

/**
 * Parallel-flow effectiveness (Incropera table 11.3): ε = [1 − e^{−NTU(1+C_r)}]/(1 + C_r).
 * @param ntu NTU [-], ≥ 0
 * @param cr C_r [-], 0–1
 * Example: NTU 5, C_r 0.7 → 0.5881156068417585 (`ht` docstring).
 */
export function effectivenessParallelFlow(ntu: number, cr: number): number {
  checkNtu(ntu);
  checkCr(cr);
  return (1 - Math.exp(-ntu * (1 + cr))) / (1 + cr);
}

/**
 * Crossflow, C_max mixed, C_min unmixed (Incropera table 11.3): ε = (1/C_r)[1 − exp(−C_r(1 − e^{−NTU}))].
 * @param ntu NTU [-], ≥ 0
 * @param cr C_r [-], 0–1 (C_r = 0: 1 − e^{−NTU})
 * Example: Holman Ex. 10-9, NTU 2.16007259528, C_r 0.1424214226633 → 0.831218036142.
 */
export function effectivenessCrossflowCmaxMixed(ntu: number, cr: number): number {
  checkNtu(ntu);
  checkCr(cr);
  const k = 1 - Math.exp(-ntu);
  if (cr === 0) return k;
  return (1 - Math.exp(-cr * k)) / cr;
}

/**
 * Crossflow, C_min mixed, C_max unmixed (Incropera table 11.3): ε = 1 − exp[−(1/C_r)(1 − e^{−C_r NTU})].
 * @param ntu NTU [-], ≥ 0
 * @param cr C_r [-], 0–1 (C_r = 0: 1 − e^{−NTU})
 * Example: NTU 1, C_r 0.5 → 0.544764.
 */
export function effectivenessCrossflowCminMixed(ntu: number, cr: number): number {
  checkNtu(ntu);
  checkCr(cr);
  if (cr === 0) return 1 - Math.exp(-ntu);
  return 1 - Math.exp(-(1 - Math.exp(-cr * ntu)) / cr);
}

/**
 * Crossflow, both fluids unmixed, approximate form (Incropera table 11.3):
 * ε = 1 − exp[(1/C_r) NTU^0.22 (e^{−C_r NTU^0.78} − 1)].
 * @param ntu NTU [-], ≥ 0
 * @param cr C_r [-], 0 < C_r ≤ 1 (C_r = 0: 1 − e^{−NTU})
 * Example: NTU 5, C_r 0.7 → 0.8444804482.
 */
export function effectivenessCrossflowUnmixedApprox(ntu: number, cr: number): number {
  checkNtu(ntu);
  checkCr(cr);
  if (cr === 0) return 1 - Math.exp(-ntu);
  return 1 - Math.exp((Math.pow(ntu, 0.22) / cr) * (Math.exp(-cr * Math.pow(ntu, 0.78)) - 1));
}

/** Series cap for the exact unmixed crossflow sum. */
const CROSSFLOW_SERIES_MAX_TERMS = 2000;

/**
 * Crossflow, both fluids unmixed, exact series (Mason 1954; the form Triboix 2009 evaluates):
 * ε = 1/(C_r NTU) Σ_{n≥0} [1 − e^{−NTU} Σ_{m=0..n} NTU^m/m!] [1 − e^{−C_r NTU} Σ_{m=0..n} (C_r NTU)^m/m!].
 * Terms vanish once n exceeds NTU by a few standard deviations; capped at 2000 terms.
 * @param ntu NTU [-], 0–1000
 * @param cr C_r [-], 0 < C_r ≤ 1
 * Example: NTU 5, C_r 0.7 → 0.84448217997 (`ht` docstring, Triboix).
 */
export function effectivenessCrossflowUnmixedExact(ntu: number, cr: number): number {
  checkNtu(ntu);
  checkCr(cr);
  if (ntu > 1000) throw new RangeError(`exact crossflow series is limited to NTU ≤ 1000 (got ${ntu})`);
  if (ntu === 0) return 0;
  if (cr === 0) return 1 - Math.exp(-ntu);
  const a = ntu;
  const b = cr * ntu;
  // Partial sums of the Poisson probabilities, built by recurrence.
  let termA = Math.exp(-a);
  let termB = Math.exp(-b);
  let cumA = termA;
  let cumB = termB;
  let sum = 0;
  for (let n = 0; n < CROSSFLOW_SERIES_MAX_TERMS; n++) {
    const add = (1 - cumA) * (1 - cumB);
    sum += add;
    if (n > a && add < 1e-17 * sum) break;
    termA *= a / (n + 1);
    termB *= b / (n + 1);
    cumA += termA;
    cumB += termB;
  }
  return sum / b;
}

/**
 * N identical exchangers in counterflow series, each of effectiveness ε_p (Shah & Sekulić 2003; Incropera):
 * ε = [((1 − ε_p C_r)/(1 − ε_p))^N − 1] / [((1 − ε_p C_r)/(1 − ε_p))^N − C_r]; C_r = 1: ε = N ε_p / (1 + (N − 1) ε_p).
 * @param passEffectiveness ε_p [-], 0 ≤ ε_p < 1
 * @param cr C_r [-], 0–1
 * @param count N ≥ 1 (integer)
 * Example: ε_p 0.5, C_r 0.5, N 2 → 0.7142857 (= 5/7).
 */
export function effectivenessCounterflowSeries(passEffectiveness: number, cr: number, count: number): number {
  if (!(passEffectiveness >= 0 && passEffectiveness < 1)) throw new RangeError(`ε_p must be within [0, 1) (got ${passEffectiveness})`);
  checkCr(cr);
  if (!(Number.isInteger(count) && count >= 1)) throw new RangeError(`exchanger count must be an integer ≥ 1 (got ${count})`);
  const e = passEffectiveness;
  if (Math.abs(1 - cr) < CR_ONE_TOL) return (count * e) / (1 + (count - 1) * e);
  const q = Math.pow((1 - e * cr) / (1 - e), count);
  return (q - 1) / (q - cr);
}

/**
 * Per-tube segment effectiveness on the water side (ENGINEERING.md 3.10 "Per-tube segment"): water mixed (its
 * temperature varies only along the tube), air unmixed:
 * P_w = 1 − exp[−(C_a,s/C_w)(1 − e^{−UA_s/C_a,s})]; Q_s = P_w C_w (T_w,in − T_a,in,s).
 * @param uaS segment conductance UA_s [W/K], ≥ 0
 * @param cAirS capacity rate of the air crossing the segment C_a,s [W/K], > 0
 * @param cWater water capacity rate C_w [W/K], > 0
 * @returns P_w [-]
 * Example: UA 100, C_a 200, C_w 1000 → 0.0756772.
 */
export function segmentEffectivenessWaterMixed(uaS: number, cAirS: number, cWater: number): number {
  if (!(uaS >= 0) || !Number.isFinite(uaS)) throw new RangeError(`segment UA must be ≥ 0 (got ${uaS})`);
  if (!(cAirS > 0)) throw new RangeError(`air capacity rate must be positive (got ${cAirS})`);
  if (!(cWater > 0)) throw new RangeError(`water capacity rate must be positive (got ${cWater})`);
  return 1 - Math.exp(-(cAirS / cWater) * (1 - Math.exp(-uaS / cAirS)));
}

function checkCoilInputs(rows: number, capacityRatioAirOverWater: number, ntuAir: number): void {
  if (!(Number.isInteger(rows) && rows >= 1)) throw new RangeError(`rows must be an integer ≥ 1 (got ${rows})`);
  if (!(capacityRatioAirOverWater >= 0) || !Number.isFinite(capacityRatioAirOverWater)) {
    throw new RangeError(`R = C_air/C_water must be ≥ 0 and finite (got ${capacityRatioAirOverWater})`);
  }
  checkNtu(ntuAir);
}

/** Below this R the R → 0 limit P_air = 1 − e^{−NTU} is used (the closed forms divide by R). */
const R_ZERO_TOL = 1e-12;

/**
 * Air-side effectiveness of an N-row serpentine counter-crossflow coil (one circuit per tube level, water enters
 * the air-leaving row, each row one pass, air unmixed, tube fluid mixed at each position): Schedwill/Nicole closed
 * forms as in Thulukkanam (2013) and `ht`, with P, R, NTU referred to the AIR stream and the 4-row ξ corrected
 * (ENGINEERING.md 3.10). K = 1 − exp(−NTU/N), P_air = (1/R)(1 − 1/ξ):
 *  N=1: ξ = e^{KR}; N=2: ξ = K/2 + (1 − K/2) e^{2KR};
 *  N=3: ξ = K[1 − K/4 − RK(1 − K/2)] e^{KR} + (1 − K/2)² e^{3KR};
 *  N=4: ξ = (K/2)(1 − K/2 + K²/4) + K(1 − K/2)[1 − 2RK(1 − K/2)] e^{2KR} + (1 − K/2)³ e^{4KR};
 *  N=5: ξ = {K(1 − 3K/4 + K²/2 − K³/8) − RK²[1 − K + 3K²/4 − K³/4 − (R/2)K²(1 − K/2)²]} e^{KR}
 *          + [K(1 − 3K/4 + K³/16) − 3RK²(1 − K/2)³] e^{3KR} + (1 − K/2)⁴ e^{5KR}.
 * Q = P_air C_air (T_w,in − T_a,in).
 * @param rows N, 1–5
 * @param capacityRatioAirOverWater R = C_air/C_water [-], ≥ 0 (may exceed 1)
 * @param ntuAir NTU = UA/C_air [-], ≥ 0
 * Example: 2 rows, R 0.5, NTU 2 → 0.7523072856.
 */
export function airEffectivenessSerpentineCounterCrossflow(rows: number, capacityRatioAirOverWater: number, ntuAir: number): number {
  checkCoilInputs(rows, capacityRatioAirOverWater, ntuAir);
  if (rows > 5) throw new RangeError(`closed forms exist for 1 to 5 rows (got ${rows})`);
  const R = capacityRatioAirOverWater;
  if (R < R_ZERO_TOL) return 1 - Math.exp(-ntuAir);
  const K = 1 - Math.exp(-ntuAir / rows);
  const h = 1 - K / 2;
  const e1 = Math.exp(K * R);
  let xi: number;
  switch (rows) {
    case 1:
      xi = e1;
      break;
    case 2:
      xi = K / 2 + h * e1 * e1;
      break;
    case 3:
      xi = K * (1 - K / 4 - R * K * h) * e1 + h * h * e1 * e1 * e1;
      break;
    case 4: {
      const e2 = e1 * e1;
      xi = (K / 2) * (1 - K / 2 + (K * K) / 4) + K * h * (1 - 2 * R * K * h) * e2 + h * h * h * e2 * e2;
      break;
    }
    default: {
      const K2 = K * K;
      const K3 = K2 * K;
      const e3 = e1 * e1 * e1;
      xi =
        (K * (1 - (3 * K) / 4 + K2 / 2 - K3 / 8) - R * K2 * (1 - K + (3 * K2) / 4 - K3 / 4 - (R / 2) * K2 * h * h)) * e1 +
        (K * (1 - (3 * K) / 4 + K3 / 16) - 3 * R * K2 * h * h * h) * e3 +
        h * h * h * h * e3 * e1 * e1;
      break;
    }
  }
  return (1 - 1 / xi) / R;
}

/**
 * Air-side effectiveness of N rows fed in parallel (single pass: every tube its own circuit from the header, all
 * flowing the same way), Schedwill form as in `ht` with P, R, NTU referred to the air stream (ENGINEERING.md 3.10):
 * P_air = (1/R){1 − [N e^{NKR} / (1 + Σ_{i=1}^{N−1} Σ_{j=0}^{i} C(i,j) K^j e^{−(i−j)NTU/N} Σ_{k=0}^{j} (NKR)^k/k!)]^{−1}},
 * K = 1 − e^{−NTU/N}.
 * @param rows N ≥ 1 (integer)
 * @param capacityRatioAirOverWater R = C_air/C_water [-], ≥ 0 (C_water = all rows together)
 * @param ntuAir NTU = UA/C_air [-], ≥ 0
 * Example: 2 rows, R 0.5, NTU 2 → 0.72471.
 */
export function airEffectivenessRowsFedInParallel(rows: number, capacityRatioAirOverWater: number, ntuAir: number): number {
  checkCoilInputs(rows, capacityRatioAirOverWater, ntuAir);
  const R = capacityRatioAirOverWater;
  if (R < R_ZERO_TOL) return 1 - Math.exp(-ntuAir);
  const N = rows;
  const K = 1 - Math.exp(-ntuAir / N);
  const nkr = N * K * R;
  let denom = 1;
  for (let i = 1; i <= N - 1; i++) {
    let binom = 1; // C(i, j), built by recurrence
    let kPow = 1; // K^j
    let poisson = 0; // Σ_{k=0..j} nkr^k / k!
    let term = 1; // nkr^j / j!
    for (let j = 0; j <= i; j++) {
      if (j > 0) {
        binom = (binom * (i - j + 1)) / j;
        kPow *= K;
        term *= nkr / j;
      }
      poisson += term;
      denom += binom * kPow * Math.exp((-(i - j) * ntuAir) / N) * poisson;
    }
  }
  const inner = (N * Math.exp(nkr)) / denom;
  return (1 - 1 / inner) / R;
}
