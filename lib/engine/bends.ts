// Minor losses of return bends, hairpins and header connections (ENGINEERING.md 3.5). K multiplies ρV²/2.

/** Sharp, flush entrance from the header into a tube (classical value; `fluids` entrance_sharp). */
export const ENTRANCE_LOSS_SHARP = 0.5;
/** Exit from a tube into the header (`fluids` exit_normal). */
export const EXIT_LOSS = 1.0;

/**
 * Bend loss coefficient, Rennels & Hudson (2012), Pipe Flow, as in `fluids` bend_rounded (ENGINEERING.md 3.5):
 * K = f_D α (R/D) + (0.10 + 2.4 f_D) sin(α/2) + 6.6 f_D [sqrt(sin(α/2)) + sin(α/2)] / (R/D)^(4α/π).
 * Includes the friction of the bend's own length. Valid at any Re through f_D (the product default, v1 decision 3).
 *
 * @param frictionFactorDarcy f_D at the local Re [-], > 0
 * @param angle_rad bend angle α [rad], 0 < α ≤ π (π for a 180° return bend)
 * @param radiusOverDiameter centre-line radius over inside diameter R/D [-], > 0.5
 * @returns K [-]
 * Example: f_D 0.03, 180°, R/D 1.34 → 0.421114.
 */
export function bendLossRennelsHudson2012(frictionFactorDarcy: number, angle_rad: number, radiusOverDiameter: number): number {
  if (!(frictionFactorDarcy > 0)) throw new RangeError(`friction factor must be positive (got ${frictionFactorDarcy})`);
  if (!(angle_rad > 0 && angle_rad <= Math.PI + 1e-12)) throw new RangeError(`bend angle must be in (0, π] rad (got ${angle_rad})`);
  if (!(radiusOverDiameter > 0.5)) throw new RangeError(`bend R/D must exceed 0.5 (got ${radiusOverDiameter})`);
  const f = frictionFactorDarcy;
  const s = Math.sin(angle_rad / 2);
  return (
    f * angle_rad * radiusOverDiameter +
    (0.1 + 2.4 * f) * s +
    (6.6 * f * (Math.sqrt(s) + s)) / Math.pow(radiusOverDiameter, (4 * angle_rad) / Math.PI)
  );
}

/**
 * 180° smooth-bend total loss coefficient, Ito (1960), J. Basic Eng. 82:131, as reproduced by Blevins (1984) and
 * `fluids` bend_rounded_Ito (ENGINEERING.md 3.5): K = 0.00431 α θ Re^−0.17 (R/D)^0.84, θ = 180,
 * α = 1 + 5.06 (R/D)^−4.52. Includes the bend-length friction.
 *
 * @param re Reynolds number [-]; the turbulent form needs Re (D/R)² > 364 (RangeError otherwise: Ito's laminar branch
 *   needs a curved-pipe friction factor that this product does not carry). Ito's data: Re ≈ 1e4–4e5; below ≈ 4000 it
 *   is an extrapolation.
 * @param radiusOverDiameter R/D [-], > 0.5
 * @param angle_deg bend angle [deg]; only 180 is supported (α for other angles is not in the reference)
 * @returns K [-]
 * Example: Re 1e4, R/D 1.34 → 0.486615.
 */
export function bendLossIto1960(re: number, radiusOverDiameter: number, angle_deg = 180): number {
  if (!(re > 0)) throw new RangeError(`Reynolds number must be positive (got ${re})`);
  if (!(radiusOverDiameter > 0.5)) throw new RangeError(`bend R/D must exceed 0.5 (got ${radiusOverDiameter})`);
  if (angle_deg !== 180) throw new RangeError(`Ito's bend loss is implemented for 180° bends only (got ${angle_deg}°)`);
  const dean2 = re / (radiusOverDiameter * radiusOverDiameter);
  if (!(dean2 > 364)) {
    throw new RangeError(`Ito's turbulent bend loss needs Re (D/R)² > 364 (got ${dean2.toFixed(1)}); use Rennels & Hudson`);
  }
  const alpha = 1 + 5.06 * Math.pow(radiusOverDiameter, -4.52);
  return 0.00431 * alpha * angle_deg * Math.pow(re, -0.17) * Math.pow(radiusOverDiameter, 0.84);
}

/**
 * Close-pattern 180° return bend, Crane TP-410 (table of K = 16/30/50 f_T at 45/90/180°, as tabulated in `fluids`):
 * K = 50 f_T. Over-predicts smooth copper U-bends (≈ 1.38 vs 0.4–0.5 at Re 1e4): a conservative option only.
 *
 * @param frictionFactorTurbulent fully turbulent Darcy friction factor of the tube size f_T [-], > 0
 * @returns K [-]
 * Example: f_T 0.02 → 1.0.
 */
export function bendLossCrane(frictionFactorTurbulent: number): number {
  if (!(frictionFactorTurbulent > 0)) throw new RangeError(`friction factor must be positive (got ${frictionFactorTurbulent})`);
  return 50 * frictionFactorTurbulent;
}
