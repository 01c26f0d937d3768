/**
 * The thermal engine's public entry: pure functions, SI, no I/O. The server calls `rate`/`size`
 * behind `POST /api/thermal/rate` and `/size`; the client calls them for live previews.
 */
export { rate, rateParsed, type RateOptions } from './rate';
export { size, sizeParsed, DEFAULT_LENGTH_STEP_M, type SizeOptions } from './size';
export { costProxy, MATERIAL_COST_FACTOR, type CostInput } from './cost-proxy';
export { ThermalInputError, type ThermalWarning } from './errors';
export { ENGINEERING_CAUTION } from './exchanger/checks';
export { correlationChoices, type CorrelationChoice, type Regime } from './correlations/select';
export { nusseltMethods, correctionMethods } from './correlations/methods';
export { frictionColebrook, frictionDarcy } from './friction';
export { effectivenessCounterflow, effectivenessShell12, effectivenessShellsInSeries, lmtdCorrectionBowman, lmtdCorrectionFactorShells } from './exchanger/effectiveness';
export { SHELL_METHODS } from './exchanger/bell-delaware';
export { DEFAULT_SHELL_METHOD } from './exchanger/shell-methods';
export { defaultFouling, processSides } from './allocation';
export { baffleSpacingWindow, bafflePlan, maxUnsupportedSpan, SEARCH_BAFFLE_CUTS, DEFAULT_BAFFLE_CUT, TEMA_MAX_UNSUPPORTED_SPAN_IN } from './geometry/baffles';
export { TUBE_SIZES, BWG_WALL_M, TUBE_MATERIALS, STANDARD_SHELLS, LAYOUTS, tubeLayout, tubeCountInShell, type Layout, type TubeLayout, type TubeLayoutKey } from './geometry';
export { fluidIds, listFluids, getFluid } from './fluids';
export type { RateRequest, RateRequestInput, RateResult, SizeRequest, SizeRequestInput, SizeResult, Design } from '../schemas/thermal';
