/**
 * Types for the parts of npm `psychrolib` (1.1.x, PsychroLib 2.5, ASHRAE Handbook—Fundamentals 2017
 * ch. 1) that the fluid library uses. The package is a UMD/CommonJS file whose export is an
 * instance of its `Psychrometrics` constructor; its unit system is per instance.
 */
declare module 'psychrolib' {
  export interface Psychrometrics {
    readonly IP: 1;
    readonly SI: 2;
    SetUnitSystem(unitSystem: 1 | 2): void;
    GetSatVapPres(tDryBulb: number): number;
    GetSatHumRatio(tDryBulb: number, pressure: number): number;
    GetHumRatioFromRelHum(tDryBulb: number, relHum: number, pressure: number): number;
    GetTDewPointFromVapPres(tDryBulb: number, vapPres: number): number;
    GetVapPresFromHumRatio(humRatio: number, pressure: number): number;
    GetMoistAirEnthalpy(tDryBulb: number, humRatio: number): number;
    GetMoistAirDensity(tDryBulb: number, humRatio: number, pressure: number): number;
  }
  const psychrolib: Psychrometrics;
  export default psychrolib;
}
