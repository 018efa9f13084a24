/**
 * Air side of the coil solve (ENGINEERING.md 3.3, 3.7, 3.8, v1 decisions 8, 9, 13): air transport properties at
 * the mean air temperature, core mass velocity and Re_Dc, Wang plain-fin (or herringbone, flagged unverified)
 * j and f with rows clamped at 6, h_o = j G_c c_p / Pr^(2/3), Schmidt fin efficiency dry and wet (Threlkeld wet
 * fin parameter), surface efficiency, and the Kays & London core pressure drop.
 */
import type { DerivedGeometry } from '@/lib/engine/geometry';
import type { Geometry, ResultWarning } from '@/lib/engine/types';
import {
  airPressureDropKaysLondon,
  colburnAndFrictionWangChiChang2000,
  colburnAndFrictionWangHwangLin2002Herringbone,
} from '@/lib/engine/air-side';
import { airConductivity_W_mK, airViscositySutherland_Pa_s } from '@/lib/engine/psychrometrics';
import { finEfficiencySchmidt1949, surfaceEfficiency } from '@/lib/engine/fins';

/** Air transport properties used by the air-side correlations (per kg of moist air). */
export interface AirTransport {
  /** Only used for the air mass flow and ΔP when fixed by a test; otherwise from the psychrometrics. */
  density_kg_m3?: number;
  viscosity_Pa_s: number;
  specificHeat_J_kgK: number;
  prandtl: number;
}

/**
 * Air transport at temperature t and humidity ratio w: Sutherland viscosity and the US Standard Atmosphere
 * conductivity of dry air (ENGINEERING.md 3.3), c_p = (1006 + 1860 W)/(1 + W) per kg of moist air (v1 decision 13),
 * Pr = μ c_p / k.
 */
export function airTransportAt(t_C: number, w: number): AirTransport {
  const tK = t_C + 273.15;
  const mu = airViscositySutherland_Pa_s(tK);
  const k = airConductivity_W_mK(tK);
  const cp = (1006 + 1860 * w) / (1 + w);
  return { viscosity_Pa_s: mu, specificHeat_J_kgK: cp, prandtl: (mu * cp) / k };
}

export interface AirSideCoefficients {
  massVelocity: number;
  reynoldsDc: number;
  j: number;
  fanning: number;
  h_o: number;
  finEfficiencyDry: number;
  surfaceEfficiencyDry: number;
  finEfficiencyWet: number;
  surfaceEfficiencyWet: number;
  warnings: ResultWarning[];
}

/**
 * Air-side coefficient and surface efficiencies.
 * @param airMassFlowMoist_kg_s moist-air mass flow
 * @param csOverCpa c_s,f / c_pa for the wet fin (1 → the wet efficiency equals the dry one)
 */
export function airSideCoefficients(
  g: Geometry,
  d: DerivedGeometry,
  airMassFlowMoist_kg_s: number,
  transport: AirTransport,
  csOverCpa: number,
): AirSideCoefficients {
  const gc = airMassFlowMoist_kg_s / d.minFreeFlowArea_m2;
  const re = (gc * d.collarDiameter_m) / transport.viscosity_Pa_s;
  const base = {
    reynoldsDc: re,
    rows: g.rows,
    collarDiameter_m: d.collarDiameter_m,
    hydraulicDiameter_m: d.hydraulicDiameter_m,
    transversePitch_m: g.transversePitch_m,
    rowPitch_m: g.rowPitch_m,
    finPitch_m: g.fin.pitch_m,
  };
  const jf =
    g.fin.type === 'wavy' && g.fin.waveDepth_m !== undefined && g.fin.waveHalfLength_m !== undefined
      ? colburnAndFrictionWangHwangLin2002Herringbone({
          ...base,
          finThickness_m: g.fin.thickness_m,
          corrugationDepth_m: g.fin.waveDepth_m,
          halfWavelength_m: g.fin.waveHalfLength_m,
          areaRatioToBareTube: d.outsideArea_m2 / d.bareTubeArea_m2,
        })
      : colburnAndFrictionWangChiChang2000(base);
  const h = (jf.j * gc * transport.specificHeat_J_kgK) / Math.pow(transport.prandtl, 2 / 3);
  const finInput = {
    h_W_m2K: h,
    finConductivity_W_mK: g.fin.conductivity_W_mK,
    finThickness_m: g.fin.thickness_m,
    collarDiameter_m: d.collarDiameter_m,
    transversePitch_m: g.transversePitch_m,
    rowPitch_m: g.rowPitch_m,
    layout: 'staggered' as const,
  };
  const etaDry = finEfficiencySchmidt1949(finInput).efficiency;
  // Wet fin (Threlkeld): m_w = m sqrt(c_s,f / c_pa), i.e. the dry formula with h replaced by h c_s,f / c_pa.
  const etaWet = csOverCpa > 1 ? finEfficiencySchmidt1949({ ...finInput, h_W_m2K: h * csOverCpa }).efficiency : etaDry;
  return {
    massVelocity: gc,
    reynoldsDc: re,
    j: jf.j,
    fanning: jf.f,
    h_o: h,
    finEfficiencyDry: etaDry,
    surfaceEfficiencyDry: surfaceEfficiency(etaDry, d.finAreaFraction),
    finEfficiencyWet: etaWet,
    surfaceEfficiencyWet: surfaceEfficiency(etaWet, d.finAreaFraction),
    warnings: airSideWarnings(jf.warnings),
  };
}

/** The correlation's messages as result warnings: "unverified" on its own, all range notes in one warning. */
function airSideWarnings(messages: string[]): ResultWarning[] {
  const out: ResultWarning[] = messages
    .filter((m) => m.includes('unverified'))
    .map((message) => ({ code: 'air-side-unverified', severity: 'warning' as const, message }));
  const ranges = messages.filter((m) => !m.includes('unverified'));
  if (ranges.length > 0) {
    out.push({ code: 'air-side-range', severity: 'warning', message: `air-side correlation used outside its data: ${ranges.join('; ')}` });
  }
  return out;
}

/** Dry air pressure drop across the core (Kays & London with Wang's f), Pa. */
export function airPressureDrop_Pa(d: DerivedGeometry, airMassFlowMoist_kg_s: number, fanning: number, densityIn: number, densityOut: number): number {
  return airPressureDropKaysLondon({
    massVelocity: airMassFlowMoist_kg_s / d.minFreeFlowArea_m2,
    densityIn,
    densityOut,
    sigma: d.sigma,
    f: fanning,
    areaRatioAoAc: d.outsideArea_m2 / d.minFreeFlowArea_m2,
  });
}
