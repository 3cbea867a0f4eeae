// Minimal typing for the psychrolib npm package (only the functions the engine uses).
// psychrolib is imported in exactly one module, lib/load/psychrometrics.ts.
declare module "psychrolib" {
  export interface Psychrolib {
    IP: number;
    SI: number;
    SetUnitSystem(unitSystem: number): void;
    GetUnitSystem(): number | undefined;
    GetHumRatioFromTWetBulb(tDryBulb: number, tWetBulb: number, pressure: number): number;
    GetHumRatioFromRelHum(tDryBulb: number, relHum: number, pressure: number): number;
    GetStandardAtmPressure(altitude: number): number;
    GetMoistAirDensity(tDryBulb: number, humRatio: number, pressure: number): number;
    GetTDewPointFromHumRatio(tDryBulb: number, humRatio: number, pressure: number): number;
  }
  const psychrolib: Psychrolib;
  export default psychrolib;
}
