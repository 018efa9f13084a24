// Types for the parts of the CommonJS/UMD package `psychrolib` (1.1.1, PsychroLib 2.5.0) that lib/engine uses.
// The package ships no declarations; its default export is a Psychrometrics instance.
declare module 'psychrolib' {
  interface Psychrometrics {
    readonly SI: number;
    readonly IP: number;
    SetUnitSystem(unitSystem: number): void;
    GetStandardAtmPressure(altitude: number): number;
    GetSatVapPres(tDryBulb: number): number;
    GetSatHumRatio(tDryBulb: number, pressure: number): number;
    GetSatAirEnthalpy(tDryBulb: number, pressure: number): number;
    GetHumRatioFromTWetBulb(tDryBulb: number, tWetBulb: number, pressure: number): number;
    GetHumRatioFromRelHum(tDryBulb: number, relHum: number, pressure: number): number;
    GetTWetBulbFromHumRatio(tDryBulb: number, humRatio: number, pressure: number): number;
    GetTDewPointFromHumRatio(tDryBulb: number, humRatio: number, pressure: number): number;
    GetRelHumFromHumRatio(tDryBulb: number, humRatio: number, pressure: number): number;
    GetMoistAirEnthalpy(tDryBulb: number, humRatio: number): number;
    GetMoistAirVolume(tDryBulb: number, humRatio: number, pressure: number): number;
    GetMoistAirDensity(tDryBulb: number, humRatio: number, pressure: number): number;
    GetHumRatioFromEnthalpyAndTDryBulb(moistAirEnthalpy: number, tDryBulb: number): number;
    GetTDryBulbFromEnthalpyAndHumRatio(moistAirEnthalpy: number, humRatio: number): number;
  }
  const psychrolib: Psychrometrics;
  export default psychrolib;
}
