/**
 * Fluid property library of the thermal engine: pure functions, SI units (°C for temperature,
 * absolute Pa for pressure), no I/O. Shared by the server and the client.
 */
export type { Fluid, FluidInfo, FluidPhase, FluidProperties } from './types';
export { fluidIds, allFluidIds, getFluid, isFluidId, listFluids, type FluidId } from './registry';
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
export { ethyleneGlycol30, ethyleneGlycol50, propyleneGlycol30, propyleneGlycol50 } from './glycols';
export { oilVg32, oilVg46, oilVg68, mineralOil, type OilGrade } from './oils';
export { waterSaturationPressure, waterSaturationTemperature } from './water-if97';
