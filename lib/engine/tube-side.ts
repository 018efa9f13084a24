// Tube-side heat transfer: Nusselt correlations and the regime words (ENGINEERING.md 3.4, v1 decision 6).
import { frictionFactorFilonenko1954 } from '@/lib/engine/friction';

export type FlowRegime = 'laminar' | 'transitional' | 'turbulent';

/** Regime bounds of v1 decision 6. */
export const LAMINAR_UPPER_RE = 2300;
export const TURBULENT_LOWER_RE = 4000;
/** End of the VDI interpolation band (ENGINEERING.md 3.4). */
export const VDI_TURBULENT_RE = 1e4;

function checkPositive(name: string, value: number): void {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${name} must be positive and finite (got ${value})`);
}

/**
 * Regime word for a tube Reynolds number (ENGINEERING.md v1 decision 6): laminar Re < 2300,
 * transitional 2300 ≤ Re < 4000, turbulent Re ≥ 4000.
 * @param re Reynolds number [-], > 0
 * Example: 3000 → 'transitional'.
 */
export function flowRegime(re: number): FlowRegime {
  checkPositive('Reynolds number', re);
  if (re < LAMINAR_UPPER_RE) return 'laminar';
  if (re < TURBULENT_LOWER_RE) return 'transitional';
  return 'turbulent';
}

function nusseltVdiLaminar(re: number, pr: number, diameterOverLength: number): number {
  const gz = re * pr * diameterOverLength;
  const nu1 = 3.66;
  const nu2 = 1.615 * Math.cbrt(gz);
  const nu3 = Math.pow(2 / (1 + 22 * pr), 1 / 6) * Math.sqrt(gz);
  const d = nu2 - 0.7;
  return Math.cbrt(nu1 * nu1 * nu1 + 0.343 + d * d * d + nu3 * nu3 * nu3);
}

function nusseltVdiTurbulent(re: number, pr: number, diameterOverLength: number): number {
  const l = 1.8 * Math.log10(re) - 1.5;
  const xi8 = 1 / (l * l) / 8;
  return ((xi8 * re * pr) / (1 + 12.7 * Math.sqrt(xi8) * (Math.pow(pr, 2 / 3) - 1))) * (1 + Math.pow(diameterOverLength, 2 / 3));
}

/**
 * Mean Nusselt number in a round tube, constant wall temperature, VDI Heat Atlas ch. G1 / Gnielinski (2013),
 * IJHMT 63:134 (ENGINEERING.md 3.4):
 *  laminar (Re ≤ 2300), Gz = Re Pr D/L: Nu = [3.66³ + 0.7³ + (1.615 Gz^(1/3) − 0.7)³ + ((2/(1+22Pr))^(1/6) Gz^(1/2))³]^(1/3);
 *  turbulent (Re ≥ 1e4): ξ = (1.8 log10 Re − 1.5)^−2, Nu = (ξ/8) Re Pr / [1 + 12.7 sqrt(ξ/8)(Pr^(2/3) − 1)] · [1 + (D/L)^(2/3)];
 *  2300 < Re < 1e4: γ = (Re − 2300)/7700, Nu = (1 − γ) Nu_lam(2300) + γ Nu_turb(1e4).
 *
 * @param re Reynolds number [-], > 0
 * @param pr Prandtl number [-], > 0 (turbulent form stated for 0.1 ≤ Pr ≤ 1000)
 * @param diameterOverLength D_i / L [-], > 0 (L = developed circuit length)
 * Example: Re 5000, Pr 10.47, D/L 0.01 → 44.0413.
 */
export function nusseltGnielinski2013Vdi(re: number, pr: number, diameterOverLength: number): number {
  checkPositive('Reynolds number', re);
  checkPositive('Prandtl number', pr);
  checkPositive('D/L', diameterOverLength);
  if (re <= LAMINAR_UPPER_RE) return nusseltVdiLaminar(re, pr, diameterOverLength);
  if (re >= VDI_TURBULENT_RE) return nusseltVdiTurbulent(re, pr, diameterOverLength);
  const gamma = (re - LAMINAR_UPPER_RE) / (VDI_TURBULENT_RE - LAMINAR_UPPER_RE);
  return (
    (1 - gamma) * nusseltVdiLaminar(LAMINAR_UPPER_RE, pr, diameterOverLength) +
    gamma * nusseltVdiTurbulent(VDI_TURBULENT_RE, pr, diameterOverLength)
  );
}

/**
 * Turbulent Nusselt number, Gnielinski (1976), Int. Chem. Eng. 16:359 (ENGINEERING.md 3.4, `ht` docstring):
 * Nu = (f/8)(Re − 1000) Pr / [1 + 12.7 sqrt(f/8)(Pr^(2/3) − 1)].
 *
 * @param re Reynolds number [-], > 1000 (stated range 3000–5e6)
 * @param pr Prandtl number [-], > 0 (stated range 0.5–2000)
 * @param frictionFactorDarcy f_D [-]; defaults to Filonenko (1954) smooth-tube f_D
 * Example: Re 1e5, Pr 1.2, f_D 0.0185 → 254.62682749359632 (`ht` docstring).
 */
export function nusseltGnielinski1976(re: number, pr: number, frictionFactorDarcy?: number): number {
  checkPositive('Prandtl number', pr);
  if (!(re > 1000)) throw new RangeError(`Gnielinski (1976) needs Re > 1000 (got ${re})`);
  const f = frictionFactorDarcy ?? frictionFactorFilonenko1954(re);
  checkPositive('friction factor', f);
  const f8 = f / 8;
  return (f8 * (re - 1000) * pr) / (1 + 12.7 * Math.sqrt(f8) * (Math.pow(pr, 2 / 3) - 1));
}

/**
 * Turbulent Nusselt number, Petukhov, Kirillov & Popov (Petukhov 1970, Adv. Heat Transfer 6:503; `ht` docstring,
 * ENGINEERING.md 3.4): Nu = (f/8) Re Pr / [C + 12.7 sqrt(f/8)(Pr^(2/3) − 1)], C = 1.07 + 900/Re − 0.63/(1 + 10 Pr).
 *
 * @param re Reynolds number [-], > 0 (stated range 4000–5e6)
 * @param pr Prandtl number [-], > 0 (stated range 0.5–1e6)
 * @param frictionFactorDarcy f_D [-]; defaults to Filonenko (1954)
 * Example: Re 1e5, Pr 1.2, f_D 0.0185 → 250.11935088905105 (`ht` docstring).
 */
export function nusseltPetukhovKirillovPopov(re: number, pr: number, frictionFactorDarcy?: number): number {
  checkPositive('Reynolds number', re);
  checkPositive('Prandtl number', pr);
  const f = frictionFactorDarcy ?? frictionFactorFilonenko1954(re);
  checkPositive('friction factor', f);
  const f8 = f / 8;
  const c = 1.07 + 900 / re - 0.63 / (1 + 10 * pr);
  return (f8 * re * pr) / (c + 12.7 * Math.sqrt(f8) * (Math.pow(pr, 2 / 3) - 1));
}

/**
 * Laminar thermal-entry mean Nusselt number, Hausen (1943), constant wall temperature (`ht` docstring,
 * ENGINEERING.md 3.4): Nu = 3.66 + 0.0668 Gz / (1 + 0.04 Gz^(2/3)), Gz = Re Pr D/L.
 *
 * @param re Reynolds number [-], > 0 (laminar use)
 * @param pr Prandtl number [-], > 0
 * @param diameterOverLength D/L [-], > 0
 * Example: Re 1e5, Pr 1.1, D/L 0.1 → 39.01352358988535 (`ht` docstring).
 */
export function nusseltHausenLaminar(re: number, pr: number, diameterOverLength: number): number {
  checkPositive('Reynolds number', re);
  checkPositive('Prandtl number', pr);
  checkPositive('D/L', diameterOverLength);
  const gz = re * pr * diameterOverLength;
  return 3.66 + (0.0668 * gz) / (1 + 0.04 * Math.pow(gz, 2 / 3));
}

/**
 * Laminar mean Nusselt number, Sieder & Tate (1936), Ind. Eng. Chem. 28:1429 (`ht` docstring, ENGINEERING.md 3.4):
 * Nu = 1.86 Gz^(1/3) (μ_b/μ_w)^0.14, Gz = Re Pr D/L.
 *
 * @param re Reynolds number [-], > 0 (laminar use)
 * @param pr Prandtl number [-], > 0
 * @param diameterOverLength D/L [-], > 0
 * @param viscosityRatio μ_bulk/μ_wall [-], > 0; 1 = no correction
 * Example: Re 1e5, Pr 1.1, D/L 0.1 → 41.366029684589265 (`ht` docstring).
 */
export function nusseltSiederTateLaminar(re: number, pr: number, diameterOverLength: number, viscosityRatio = 1): number {
  checkPositive('Reynolds number', re);
  checkPositive('Prandtl number', pr);
  checkPositive('D/L', diameterOverLength);
  checkPositive('viscosity ratio', viscosityRatio);
  return 1.86 * Math.cbrt(re * pr * diameterOverLength) * Math.pow(viscosityRatio, 0.14);
}
