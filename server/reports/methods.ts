/**
 * The calculation methods a report lists with their published sources. The solve result's own `methods` list is
 * used when present; otherwise this fixed list names the sources ENGINEERING.md gives for the methods the engine
 * uses (its Appendix B carries the full references).
 */
import type { MethodNote, SolveResult } from '@/lib/engine/types';

export const DEFAULT_METHODS: readonly MethodNote[] = [
  { topic: 'Water properties', method: 'Density and heat capacity from the industrial formulation', source: 'IAPWS R7-97 (2012), IF97' },
  { topic: 'Water viscosity', method: 'IAPWS 2008 formulation', source: 'IAPWS R12-08; Huber et al. (2009)' },
  { topic: 'Water thermal conductivity', method: 'IAPWS 2011 formulation', source: 'IAPWS R15-11; Huber et al. (2012)' },
  { topic: 'Glycol solutions', method: 'Polynomial property fits', source: 'Melinder (2010), Properties of Secondary Working Fluids, IIR' },
  { topic: 'Moist air', method: 'Psychrometric relations (psychrolib)', source: 'ASHRAE Handbook Fundamentals (2017), ch. 1' },
  { topic: 'Tube friction', method: 'Friction factor for all regimes', source: 'Churchill (1977), Chem. Eng. 84(24)' },
  { topic: 'Return bends and hairpins', method: 'Bend loss coefficient with the local friction factor', source: 'Rennels & Hudson (2012), Pipe Flow' },
  { topic: 'Tube-side heat transfer', method: 'Laminar, transitional and turbulent Nusselt number', source: 'Gnielinski (2013), IJHMT 63; VDI Heat Atlas (2010) ch. G1' },
  { topic: 'Air-side heat transfer and friction', method: 'Plain-fin staggered bank correlation', source: 'Wang, Chi & Chang (2000), IJHMT 43' },
  { topic: 'Fin efficiency', method: 'Equivalent circular fin', source: 'Schmidt (1949), Refrigerating Engineering 57' },
  { topic: 'Wet (dehumidifying) surface', method: 'Enthalpy-based effectiveness model', source: 'Braun, Klein & Mitchell (1989), ASHRAE Trans. 95(2)' },
];

export function methodsFor(result: SolveResult): readonly MethodNote[] {
  return result.methods && result.methods.length > 0 ? result.methods : DEFAULT_METHODS;
}
