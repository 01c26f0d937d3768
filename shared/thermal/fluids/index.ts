/**
 * Fluid property library of the thermal engine: pure functions, SI units (°C for temperature,
 * absolute Pa for pressure), no I/O. Shared by the server and the client.
 */
export type { Fluid, FluidInfo, FluidPhase, FluidProperties } from './types';
export {
  fluidIds,
  allFluidIds,
  fluidIdsInWords,
  getFluid,
  isFluidId,
  listFluids,
  unknownFluidProblem,
  type FluidId,
} from './registry';
export { constantFluid, CONSTANT_FLUID_ID, type ConstantFluidInput } from './constant';
export { water } from './water';
export { air, AIR_MAX_PRESSURE_PA } from './air';
export { airMoist, moistAirProperties, DESIGN_HUMIDITY_RATIO } from './air-moist';
export {
  humidityRatioFromIntake,
  saturationHumidityRatio,
  saturationVapourPressure,
  dewPointAtPressure,
  latentHeatOfCondensation,
  moistAirEnthalpy,
  type IntakeConditions,
} from './psychro';
export {
  ethyleneGlycol30,
  ethyleneGlycol50,
  propyleneGlycol30,
  propyleneGlycol50,
  glycolMixture,
  glycolFreezingPoint,
  glycolFluidIds,
  parseGlycolId,
  GLYCOL_PERCENTS,
  GLYCOL_MIN_PERCENT,
  GLYCOL_MAX_PERCENT,
  type GlycolKind,
  type GlycolFluidId,
} from './glycols';
export { oilVg32, oilVg46, oilVg68, mineralOil, type OilGrade } from './oils';
export { waterSaturationPressure, waterSaturationTemperature } from './water-if97';
