/**
 * Request and result shapes of `POST /api/thermal/rate` and `POST /api/thermal/size` (issue 3).
 * All SI. These schemas reject malformed input (HTTP 400 naming the field), including numbers
 * outside the physical range a cooler of this shop can have (issue 9: a 9.2e18 m shell once froze
 * the tube-layout loop); lists are short and de-duplicated. Physically impossible but in-range input
 * (zero or negative flows, a target past the coolant, water above boiling…) passes here and is
 * refused by the engine with a ThermalInputError (HTTP 422).
 */
import { z } from 'zod';
import { correlationChoices } from '../thermal/correlations/select';
import { fluidIds, unknownFluidProblem } from '../thermal/fluids/registry';
import { tubeMaterialIds } from '../thermal/geometry/materials';
import { FLOW_FIELDS } from '../thermal/flow-units';

const num = z.number();

/**
 * A number inside [min, max]; the message names the quantity and the range in words, e.g.
 * "Shell inner diameter must be between 0.05 and 2.5 m." (the error's path names the field).
 */
function within(what: string, min: number, max: number, unit: string, opts: { exclusiveMin?: boolean } = {}) {
  const error = opts.exclusiveMin
    ? `${what} must be above ${min} and at most ${max} ${unit}.`
    : `${what} must be between ${min} and ${max} ${unit}.`;
  const n = z.number({ error: `${what} must be a number (${unit}).` });
  return (opts.exclusiveMin ? n.gt(min, { error }) : n.min(min, { error })).max(max, { error });
}

/**
 * Physical ranges of the request's numbers. Wide enough for every cooler the engine can size (shells
 * to 1.5 m in its catalogue, shared/thermal/geometry/shells.ts; fluids from −40 to 400 °C), narrow
 * enough that no input makes the engine's loops or tables grow without end.
 */
export const LIMITS = {
  /** absolute pressure, Pa: 0.01 to 300 bar */
  pressure_Pa: [1e3, 3e7],
  /** °C: below every fluid's range to above it; the fluid's own range is checked by the engine (422) */
  temp_C: [-100, 600],
  /** kg/s, magnitude (zero and negative flows reach the engine, which explains them with a 422) */
  massFlow_kg_s: [-1000, 1000],
  /** m³/s, magnitude, at the inlet state or at the normal/standard reference (the mass flow it makes is held to the kg/s range) */
  volumeFlow_m3_s: [-1000, 1000],
  /** m: the catalogue's shells run 0.10 to 1.5 m; larger rolled shells to 2.5 m may be rated */
  shellInnerDiameter_m: [0.05, 2.5],
  /** m: the catalogue has 3/8 in (9.5 mm) to 1 1/4 in tubes; 5 to 100 mm accepted */
  tubeOuterDiameter_m: [0.005, 0.1],
  tubeWall_m: [0, 0.01],
  /** m: a tube longer than 12 m is not drawn or shipped (common practice) */
  tubeLength_m: [0, 12],
  tubeCount: [1, 20_000],
  tubePitch_m: [0.005, 0.2],
  baffleSpacing_m: [0.02, 5],
  nozzleDiameter_m: [0.005, 0.6],
  roughness_m: [0, 1e-3],
  /** m²K/W: TEMA's highest tabulated fouling resistances are about 0.002 (memory) */
  fouling_m2K_W: [0, 0.01],
  /** Pa: a pressure-drop limit up to 300 bar */
  pressureDrop_Pa: [0, 3e7],
  /** m: the shop's length increment */
  lengthStep_m: [0.001, 1],
  /** members of any list of choices in a sizing request: the sizing page offers 9 tube sizes, 8 materials */
  listMax: 10,
} as const;

const L = LIMITS;
const pressure = (what: string) => within(what, L.pressure_Pa[0], L.pressure_Pa[1], 'Pa (absolute)');
const temperature = (what: string) => within(what, L.temp_C[0], L.temp_C[1], '°C');
const massFlow = (what: string) => within(what, L.massFlow_kg_s[0], L.massFlow_kg_s[1], 'kg/s');
const volumeFlow = (what: string) => within(what, L.volumeFlow_m3_s[0], L.volumeFlow_m3_s[1], 'm³/s');
export const standardReferenceSchema = z.enum(['normal', 'standard'], { error: 'The standard reference must be "normal" (0 °C, 101.325 kPa) or "standard" (60 °F, 14.696 psia).' });

/**
 * A stream's flow (issue 12): exactly one of a mass flow, a volume flow at the stream's inlet state,
 * or a normal/standard volume flow with its reference (shared/thermal/flow-units.ts); the engine turns
 * it into kg/s (shared/thermal/flow-basis.ts). The exactly-one rule is `flowIssues`, applied by the
 * request schemas (a refined object could no longer be extended).
 */
function flowShape(what: string) {
  return {
    massFlow_kg_s: massFlow(`${what} mass flow`).optional(),
    volumeFlow_m3_s: volumeFlow(`${what} volume flow`).optional(),
    standardVolumeFlow_m3_s: volumeFlow(`${what} standard volume flow`).optional(),
    standardReference: standardReferenceSchema.optional(),
  };
}

type FlowGiven = { massFlow_kg_s?: number; volumeFlow_m3_s?: number; standardVolumeFlow_m3_s?: number; standardReference?: string };

/** Issues of one stream's flow: none or two given (`required`), a reference without its flow or the reverse. */
export function flowIssues(s: FlowGiven, path: (string | number)[], required: boolean): { message: string; path: (string | number)[] }[] {
  const fields = Object.values(FLOW_FIELDS);
  const given = fields.filter((f) => s[f] !== undefined);
  const out: { message: string; path: (string | number)[] }[] = [];
  const names = 'massFlow_kg_s, volumeFlow_m3_s or standardVolumeFlow_m3_s';
  if (given.length === 0 && required) out.push({ message: `Give the flow: exactly one of ${names}.`, path: [...path, 'massFlow_kg_s'] });
  for (const extra of given.slice(1)) {
    out.push({ message: `Give only one flow: ${given[0]} is already given, so leave out ${extra} (exactly one of ${names}).`, path: [...path, extra] });
  }
  if (s.standardVolumeFlow_m3_s !== undefined && s.standardReference === undefined) {
    out.push({ message: 'Say which reference the standard volume flow is at: "normal" (0 °C, 101.325 kPa) or "standard" (60 °F, 14.696 psia).', path: [...path, 'standardReference'] });
  }
  if (s.standardReference !== undefined && s.standardVolumeFlow_m3_s === undefined) {
    out.push({ message: 'A standard reference belongs to standardVolumeFlow_m3_s: give that flow, or leave the reference out.', path: [...path, 'standardReference'] });
  }
  return out;
}
const fouling = (what: string) => within(what, L.fouling_m2K_W[0], L.fouling_m2K_W[1], 'm²K/W');
const pressureDrop = (what: string) => within(what, L.pressureDrop_Pa[0], L.pressureDrop_Pa[1], 'Pa', { exclusiveMin: true });
const shellDiameter = (what: string) => within(what, L.shellInnerDiameter_m[0], L.shellInnerDiameter_m[1], 'm');
const tubeDiameter = () => within('Tube outside diameter', L.tubeOuterDiameter_m[0], L.tubeOuterDiameter_m[1], 'm');
const tubeLength = (what: string) => within(what, L.tubeLength_m[0], L.tubeLength_m[1], 'm', { exclusiveMin: true });
const tubeCountMessage = `The tube count must be a whole number from ${L.tubeCount[0]} to ${L.tubeCount[1]}.`;

/** A short list of choices: at most LIMITS.listMax members as sent, repeats dropped (first kept). */
function choices<T extends z.ZodType>(item: T, what: string) {
  return z
    .array(item)
    .min(1, { error: `Give at least one ${what}, or leave the list out.` })
    .max(L.listMax, { error: `Give at most ${L.listMax} ${what}s.` })
    .transform((xs) => [...new Set(xs)]);
}

/**
 * A library fluid id. Glycol–water mixtures: `ethylene-glycol-<p>` / `propylene-glycol-<p>` with
 * p = 10, 15, …, 60 % glycol by mass; a strength outside that is refused naming the range.
 */
export const fluidIdSchema = z.enum(fluidIds, {
  error: (iss) => (typeof iss.input === 'string' ? (unknownFluidProblem(iss.input) ?? undefined) : undefined),
});

/** A customer's own constant properties, SI. */
export const constantFluidSchema = z.object({
  constant: z.object({
    density: within('Density', 0.01, 20_000, 'kg/m³'),
    specificHeat: within('Specific heat', 100, 20_000, 'J/(kg K)'),
    viscosity: within('Viscosity', 1e-6, 100, 'Pa s'),
    conductivity: within('Thermal conductivity', 0.001, 500, 'W/(m K)'),
  }),
});

export const fluidRefSchema = z.union([fluidIdSchema, constantFluidSchema], {
  // a string that is no library id: say why (unknown, or a glycol strength outside 10–60 %)
  error: (iss) => (typeof iss.input === 'string' ? (unknownFluidProblem(iss.input) ?? undefined) : undefined),
});
export type FluidRef = z.infer<typeof fluidRefSchema>;

/** Intake air of a compressor (`air-moist`): sets the water the air carries. */
export const intakeSchema = z.object({
  temp_C: temperature('Intake temperature'),
  /** 0…1 */
  relativeHumidity: within('Relative humidity', 0, 1, '(a fraction)'),
  pressure_Pa: pressure('Intake pressure'),
});

/**
 * A stream's design pressure (absolute, like every pressure here) and design temperature, for the
 * walls (issue 11). Optional: by default the operating pressure plus 10 % (at least 1 bar more) and
 * the process inlet temperature plus 25 K (shared/thermal/checks/walls.ts).
 */
export const designPointSchema = z.object({
  pressure_Pa: pressure('Design pressure'),
  temp_C: temperature('Design temperature'),
});

/** The stream inside the tubes. `pressure_Pa` absolute. */
export const processStreamSchema = z.object({
  fluid: fluidRefSchema,
  pressure_Pa: pressure('Process pressure'),
  ...flowShape('Process'),
  inletTemp_C: temperature('Process inlet temperature'),
  intake: intakeSchema.optional(),
  design: designPointSchema.optional(),
});

export const layoutSchema = z.union([z.literal(30), z.literal(60), z.literal(90), z.literal(45)]);

export const wallBoundarySchema = z.object({ kind: z.literal('wall'), wallTemp_C: temperature('Wall temperature') });

export const coolantBoundarySchema = z.object({
  kind: z.literal('coolant'),
  fluid: fluidRefSchema,
  pressure_Pa: pressure('Coolant pressure'),
  ...flowShape('Coolant'),
  inletTemp_C: temperature('Coolant inlet temperature'),
  shellInnerDiameter_m: shellDiameter('Shell inner diameter').optional(),
  baffleSpacing_m: within('Baffle spacing', L.baffleSpacing_m[0], L.baffleSpacing_m[1], 'm').optional(),
  /** fraction of the shell diameter, 0.15–0.45 */
  baffleCut: within('Baffle cut', 0.15, 0.45, '(a fraction of the shell diameter)').optional(),
  /** first and last baffle spacing (at the shell nozzles), m; default: the central spacing widened where the nozzle needs room */
  inletBaffleSpacing_m: within('Inlet baffle spacing', L.baffleSpacing_m[0], L.baffleSpacing_m[1], 'm').optional(),
  outletBaffleSpacing_m: within('Outlet baffle spacing', L.baffleSpacing_m[0], L.baffleSpacing_m[1], 'm').optional(),
  tubePitch_m: within('Tube pitch', L.tubePitch_m[0], L.tubePitch_m[1], 'm').optional(),
  layout: layoutSchema.optional(),
  foulingInside_m2K_W: fouling('Tube-side fouling resistance').optional(),
  foulingOutside_m2K_W: fouling('Shell-side fouling resistance').optional(),
  design: designPointSchema.optional(),
});

export const boundarySchema = z.discriminatedUnion('kind', [wallBoundarySchema, coolantBoundarySchema]);

const tubePasses = z
  .int()
  .min(1)
  .max(8)
  .refine((n) => n === 1 || n % 2 === 0, { error: 'Tube passes must be 1 or an even number up to 8.' });

/** TEMA construction (front head, shell, rear head) and class (issue 11, shared/thermal/checks/construction.ts). */
export const constructionSchema = z.enum(['BEM', 'BEU', 'AES', 'AET']);
export type Construction = z.infer<typeof constructionSchema>;
export const temaClassSchema = z.enum(['R', 'C', 'B']);
export type TemaClass = z.infer<typeof temaClassSchema>;

/** Which side the process (hot) stream is on; the coolant takes the other. */
export const processSideSchema = z.enum(['tubes', 'shell']);
export type ProcessSide = z.infer<typeof processSideSchema>;
/** Shell-side methods (shared/thermal/exchanger/shell-methods.ts); Bell–Delaware is the default. */
export const shellMethodSchema = z.enum(['bell-delaware', 'kern']);
export type ShellMethod = z.infer<typeof shellMethodSchema>;
/** 1–4 identical shells in series (each 1-2, or counterflow 1-1 for one tube pass). */
export const SHELLS_IN_SERIES_MAX = 4;
const shellsInSeries = (what: string) =>
  z.int({ error: `${what} must be a whole number from 1 to ${SHELLS_IN_SERIES_MAX}.` }).min(1, { error: `${what} must be a whole number from 1 to ${SHELLS_IN_SERIES_MAX}.` }).max(SHELLS_IN_SERIES_MAX, { error: `${what} must be a whole number from 1 to ${SHELLS_IN_SERIES_MAX}.` });

export const geometrySchema = z
  .object({
    tubeOuterDiameter_m: tubeDiameter(),
    tubeWall_m: within('Tube wall', L.tubeWall_m[0], L.tubeWall_m[1], 'm', { exclusiveMin: true }),
    tubeCount: z.int({ error: tubeCountMessage }).min(L.tubeCount[0], { error: tubeCountMessage }).max(L.tubeCount[1], { error: tubeCountMessage }),
    tubeLength_m: tubeLength('Tube length'),
    tubePasses,
    roughness_m: within('Roughness', L.roughness_m[0], L.roughness_m[1], 'm').default(1.5e-6),
    tubeMaterial: z.enum(tubeMaterialIds).default('carbon-steel'),
    /** optional tube-side nozzle bore, m: adds nozzle losses to the pressure drop */
    nozzleDiameter_m: within('Nozzle bore', L.nozzleDiameter_m[0], L.nozzleDiameter_m[1], 'm').optional(),
    /** the process stream in the tubes (default) or on the shell side; a wall boundary needs 'tubes' */
    processSide: processSideSchema.optional(),
    /** identical shells in series (default 1); tubeCount and tubeLength_m are per shell */
    shellsInSeries: shellsInSeries('Shells in series').optional(),
  })
  .refine((g) => g.tubeWall_m < g.tubeOuterDiameter_m / 2, { error: 'The tube wall must be thinner than half the outside diameter.', path: ['tubeWall_m'] })
  .refine((g) => g.tubeCount % g.tubePasses === 0, { error: 'The tube count must divide evenly among the tube passes.', path: ['tubeCount'] });

export const correlationSchema = z.enum(correlationChoices).default('auto');

/** Every stream of a request gives exactly one flow (issue 12). */
function requireFlows(r: { process: FlowGiven; boundary: FlowGiven & { kind: string } }, ctx: z.RefinementCtx): void {
  for (const issue of flowIssues(r.process, ['process'], true)) ctx.addIssue({ code: 'custom', ...issue });
  if (r.boundary.kind === 'coolant') for (const issue of flowIssues(r.boundary, ['boundary'], true)) ctx.addIssue({ code: 'custom', ...issue });
}

export const rateRequestSchema = z.object({
  process: processStreamSchema,
  boundary: boundarySchema,
  geometry: geometrySchema,
  correlation: correlationSchema,
  /** force a shell-side method; default Bell–Delaware (Kern is always computed beside it) */
  shellMethod: shellMethodSchema.optional(),
}).superRefine(requireFlows);
export type RateRequest = z.infer<typeof rateRequestSchema>;
export type RateRequestInput = z.input<typeof rateRequestSchema>;

export const sizeConstraintsSchema = z.object({
  maxTubeLength_m: tubeLength('Maximum tube length'),
  maxPressureDrop_Pa: pressureDrop('Tube-side pressure-drop limit'),
  maxShellPressureDrop_Pa: pressureDrop('Shell-side pressure-drop limit').optional(),
  tubeOuterDiameters_m: choices(tubeDiameter(), 'tube outside diameter').optional(),
  materials: choices(z.enum(tubeMaterialIds), 'material').optional(),
  tubePasses: choices(tubePasses, 'pass count').optional(),
  layouts: choices(layoutSchema, 'layout').optional(),
  foulingInside_m2K_W: fouling('Tube-side fouling resistance').optional(),
  foulingOutside_m2K_W: fouling('Shell-side fouling resistance').optional(),
  maxShellInnerDiameter_m: shellDiameter('Maximum shell inner diameter').optional(),
  /** shop's length increment, m (default 0.1) */
  lengthStep_m: within('Length step', L.lengthStep_m[0], L.lengthStep_m[1], 'm').optional(),
  /** where the process stream may go; default 'either' (the search tries both and says why one won) */
  processSide: z.enum(['tubes', 'shell', 'either']).optional(),
  /** most identical shells in series the search may use (default 4) */
  maxShellsInSeries: shellsInSeries('Most shells in series').optional(),
  /** TEMA class the duty asks for (default C, general commercial service) */
  temaClass: temaClassSchema.optional(),
  /**
   * issue 11: design margin on area, % (lengths are sized for the required length × (1 + margin),
   * the length round-up on top). A quote is sized with at least the price book's `designMargin_pct`.
   */
  designMargin_pct: within('Design margin', 0, 100, '%').optional(),
});

/** 4: operating cases a duty may carry besides its design point (issue 11). */
export const OPERATING_CASES_MAX = 4;

/**
 * One operating case (issue 11): a name and partial overrides of the design duty's process stream
 * and boundary (e.g. summer coolant at 32 °C, winter at 15 °C, fouled/clean, turndown flow). The
 * fluids stay the duty's; a field left out keeps the design point's value.
 */
export const operatingCaseSchema = z.object({
  name: z.string({ error: 'Name the operating case.' }).trim().min(1, { error: 'Name the operating case.' }).max(60, { error: 'Use at most 60 characters for a case name.' }),
  process: z
    .object({
      ...flowShape('Process'),
      inletTemp_C: temperature('Process inlet temperature').optional(),
      outletTemp_C: temperature('Process outlet temperature').optional(),
      pressure_Pa: pressure('Process pressure').optional(),
    })
    .optional(),
  boundary: z
    .object({
      ...flowShape('Coolant'),
      inletTemp_C: temperature('Coolant inlet temperature').optional(),
      pressure_Pa: pressure('Coolant pressure').optional(),
      foulingInside_m2K_W: fouling('Tube-side fouling resistance').optional(),
      foulingOutside_m2K_W: fouling('Shell-side fouling resistance').optional(),
      wallTemp_C: temperature('Wall temperature').optional(),
    })
    .optional(),
});
export type OperatingCase = z.infer<typeof operatingCaseSchema>;

export const sizeRequestSchema = z.object({
  process: processStreamSchema.extend({ outletTemp_C: temperature('Process outlet temperature') }),
  boundary: boundarySchema,
  constraints: sizeConstraintsSchema,
  correlation: correlationSchema,
  shellMethod: shellMethodSchema.optional(),
  /** issue 11: up to four operating cases besides the design point; the search sizes for the governing one and rates all */
  cases: z
    .array(operatingCaseSchema)
    .max(OPERATING_CASES_MAX, { error: `Give at most ${OPERATING_CASES_MAX} operating cases.` })
    .optional(),
}).superRefine((r, ctx) => {
  requireFlows(r, ctx);
  // a design point (issue 11) is the most the stream may see: never below its own operating point
  const designBelow = (design: { pressure_Pa: number; temp_C: number } | undefined, pressure: number, temp: number, path: string[], words: string) => {
    if (!design) return;
    if (design.pressure_Pa < pressure - 1e-6) {
      ctx.addIssue({ code: 'custom', message: `The ${words} design pressure is below its operating pressure: give at least the operating pressure.`, path: [...path, 'design', 'pressure_Pa'] });
    }
    if (design.temp_C < temp - 1e-9) {
      ctx.addIssue({ code: 'custom', message: `The ${words} design temperature is below its inlet temperature ${temp} °C: give at least that.`, path: [...path, 'design', 'temp_C'] });
    }
  };
  designBelow(r.process.design, r.process.pressure_Pa, r.process.inletTemp_C, ['process'], 'process');
  if (r.boundary.kind === 'coolant') designBelow(r.boundary.design, r.boundary.pressure_Pa, r.boundary.inletTemp_C, ['boundary'], 'coolant');
  const seen = new Set<string>();
  (r.cases ?? []).forEach((c, i) => {
    if (seen.has(c.name.toLowerCase())) ctx.addIssue({ code: 'custom', message: 'Give each operating case its own name.', path: ['cases', i, 'name'] });
    seen.add(c.name.toLowerCase());
    // a case may leave its flows out (the design point's stay) but gives at most one per stream
    for (const issue of flowIssues(c.process ?? {}, ['cases', i, 'process'], false)) ctx.addIssue({ code: 'custom', ...issue });
    for (const issue of flowIssues(c.boundary ?? {}, ['cases', i, 'boundary'], false)) ctx.addIssue({ code: 'custom', ...issue });
    const b = c.boundary ?? {};
    if (r.boundary.kind === 'wall' && (['massFlow_kg_s', 'volumeFlow_m3_s', 'standardVolumeFlow_m3_s', 'inletTemp_C', 'pressure_Pa', 'foulingInside_m2K_W', 'foulingOutside_m2K_W'] as const).some((k) => b[k] !== undefined)) {
      ctx.addIssue({ code: 'custom', message: 'A wall-cooled duty has no coolant stream: a case may change only the wall temperature.', path: ['cases', i, 'boundary'] });
    }
    if (r.boundary.kind === 'coolant' && b.wallTemp_C !== undefined) {
      ctx.addIssue({ code: 'custom', message: 'A coolant-cooled duty has no wall temperature: change the coolant inlet temperature or flow instead.', path: ['cases', i, 'boundary', 'wallTemp_C'] });
    }
  });
});
export type SizeRequest = z.infer<typeof sizeRequestSchema>;
export type SizeRequestInput = z.input<typeof sizeRequestSchema>;

// ---- results ----

export const warningSchema = z.object({ code: z.string(), message: z.string() });

export const profilePointSchema = z.object({ x_m: num, process_C: num, coolant_C: num.optional() });

/** One screened span: its worst tube (a window tube, held at every second baffle) at that place. */
export const vibrationSpanSchema = z.object({
  where: z.enum(['inlet', 'central', 'outlet']),
  span_m: num,
  crossflowVelocity_m_s: num,
  criticalVelocity_m_s: num,
  ok: z.boolean(),
  ends: z.enum(['pinned-pinned', 'clamped-pinned', 'clamped-clamped']).optional(),
  tube: z.enum(['window', 'baffled']).optional(),
  velocityRatio: num.optional(),
  naturalFrequency_Hz: num.optional(),
  vortexFrequency_Hz: z.tuple([num, num]).optional(),
  buffetingFrequency_Hz: num.optional(),
  fluidElasticOk: z.boolean().optional(),
  vortexOk: z.boolean().optional(),
});

export const vibrationSchema = z.object({
  spans: z.array(vibrationSpanSchema),
  ok: z.boolean(),
  connorsK: num.optional(),
  logDecrement: num.optional(),
  addedMassCoefficient: num.optional(),
  massPerLength_kg_m: num.optional(),
});
export type Vibration = z.infer<typeof vibrationSchema>;

/** One nozzle of one shell (issue 11): NPS label, bore, velocity and ρv² at it, impingement plate at a shell inlet. */
export const nozzleSchema = z.object({
  side: z.enum(['tube', 'shell']),
  role: z.enum(['inlet', 'outlet']),
  label: z.string(),
  innerDiameter_m: num,
  velocity_m_s: num,
  rhoV2: num,
  impingementPlate: z.boolean(),
});
export type DesignNozzle = z.infer<typeof nozzleSchema>;

export const rateResultSchema = z.object({
  outletTemp_C: num,
  duty_W: num,
  regime: z.enum(['laminar', 'transitional', 'turbulent']),
  /** label of the method that ran (a method-table key) */
  correlation: z.string(),
  correlationName: z.string(),
  corrections: z.array(z.string()),
  reynolds: num,
  prandtl: num,
  nusselt: num,
  htc_W_m2K: num,
  velocity_m_s: num,
  entranceLength_m: num,
  frictionFactor: num,
  pressureDrop: z.object({ friction_Pa: num, returns_Pa: num, nozzles_Pa: num, total_Pa: num }),
  bulkMeanTemp_C: num,
  area_m2: num,
  warnings: z.array(warningSchema),
  /** the domain brief's caution: an estimate, to be checked under the pressure-vessel code in force */
  caution: z.string(),
  profile: z.array(profilePointSchema),
  coolantOutletTemp_C: num.optional(),
  overallU_W_m2K: num.optional(),
  effectiveness: num.optional(),
  ntu: num.optional(),
  lmtdCorrectionF: num.optional(),
  shellPressureDrop_Pa: num.optional(),
  shellVelocity_m_s: num.optional(),
  shellHtc_W_m2K: num.optional(),
  shellInnerDiameter_m: num.optional(),
  condensate_kg_s: num.optional(),
  latentDuty_W: num.optional(),
  // ---- issue 10: allocation, shell-side method, shells in series (coolant boundary only) ----
  processSide: processSideSchema.optional(),
  tubeFluid: z.enum(['process', 'coolant']).optional(),
  shellFluid: z.enum(['process', 'coolant']).optional(),
  shellsInSeries: z.int().optional(),
  /** the method whose shell-side h and ΔP were used */
  shellMethod: shellMethodSchema.optional(),
  shellHtcKern_W_m2K: num.optional(),
  /** total over all shells */
  shellPressureDropKern_Pa: num.optional(),
  shellReynolds: num.optional(),
  shellCorrections: z.object({ Jc: num, Jl: num, Jb: num, Js: num, Jr: num }).optional(),
  shellPressureDropBreakdown: z.object({ crossflow_Pa: num, window_Pa: num, ends_Pa: num, nozzles_Pa: num.optional(), total_Pa: num }).optional(),
  baffleSpacing_m: num.optional(),
  inletBaffleSpacing_m: num.optional(),
  outletBaffleSpacing_m: num.optional(),
  baffleCut: num.optional(),
  /** per shell */
  baffleCount: z.int().optional(),
  /** tubes rated against tubes the laid-out tubesheet holds (1 = full) */
  shellFill: num.optional(),
  /** fouling resistances used, m²K/W: the request's, else each fluid's default */
  foulingTube_m2K_W: num.optional(),
  foulingShell_m2K_W: num.optional(),
  /** issue 11: the nozzles the rating sized and counted in both pressure drops (shared/thermal/checks/nozzles.ts), one shell's */
  nozzles: z.array(nozzleSchema).optional(),
  /** false when a nozzle would be wider than half the shell (hard finding nozzle-too-large) */
  nozzlesOk: z.boolean().optional(),
  /** issue 11: flow-induced vibration screen of the bundle (shared/thermal/checks/vibration.ts), coolant boundary only */
  vibration: vibrationSchema.optional(),
  /**
   * issue 11: half-width of the band on the process outlet, K, from the stated accuracy of the film
   * correlations that ran, U re-evaluated at its low and high ends (shared/thermal/exchanger/uncertainty.ts)
   */
  outletUncertainty_K: num.optional(),
});
export type RateResult = z.infer<typeof rateResultSchema>;

/** One operating case rated on a design (issue 11). */
export const caseResultSchema = z.object({
  name: z.string(),
  outletTemp_C: num,
  /** tube side, total over all shells */
  pressureDrop_Pa: num,
  shellPressureDrop_Pa: num.optional(),
  outletUncertainty_K: num.optional(),
  /** the case's target outlet */
  targetOutletTemp_C: num.optional(),
  coolantInletTemp_C: num.optional(),
  /** the outlet reaches the target within the pressure-drop limits */
  meets: z.boolean().optional(),
});
export type CaseResult = z.infer<typeof caseResultSchema>;

export const designSchema = z.object({
  /** per shell (as tubeLength_m); area_m2 counts every shell */
  tubeCount: z.int(),
  tubeLength_m: num,
  tubePasses: z.int(),
  tubeOuterDiameter_m: num,
  tubeWall_m: num,
  tubeWallLabel: z.string(),
  tubeMaterial: z.string(),
  layout: layoutSchema.optional(),
  tubePitch_m: num.optional(),
  shellInnerDiameter_m: num.optional(),
  shellLabel: z.string().optional(),
  baffleSpacing_m: num.optional(),
  // issue 10; absent on designs stored before it (readers default: tubes, 1 shell, cut 0.25)
  processSide: processSideSchema.optional(),
  shellsInSeries: z.int().optional(),
  baffleCut: num.optional(),
  baffleCount: z.int().optional(),
  inletBaffleSpacing_m: num.optional(),
  outletBaffleSpacing_m: num.optional(),
  /** why each fluid goes where, in words */
  allocationReason: z.string().optional(),
  /** on the recommended design: why it won */
  recommendedReason: z.string().optional(),
  // issue 11, walls for pressure (shared/thermal/checks/walls.ts); absent on designs stored before it
  /** least tube wall for the tube side's design pressure + corrosion allowance, at least the minimum gauge, m */
  tubeWallRequired_m: num.optional(),
  /** least shell wall for the shell side's design pressure + corrosion allowance, m */
  shellWallRequired_m: num.optional(),
  /** the shell's wall: the pipe's STD wall or the rolled plate that covers the pressure, m */
  shellWall_m: num.optional(),
  // issue 11, nozzles and construction; absent on designs stored before it (readers: flow rule, BEM, class C)
  nozzles: z.array(nozzleSchema).optional(),
  construction: constructionSchema.optional(),
  temaClass: temaClassSchema.optional(),
  /** why this construction, in words */
  constructionReason: z.string().optional(),
  /** issue 11: design margin on area the length was sized with, % (absent: none, designs stored before it) */
  designMargin_pct: num.optional(),
  /** issue 11: the design rated under the design point and every operating case of the duty */
  cases: z.array(caseResultSchema).optional(),
  /** issue 11: the case that needed the largest area (the one the search sized for) */
  governingCase: z.string().optional(),
  /** issue 11: TEMA's tie rods of one shell (RCB-4.71, memory) as the tubesheet layout places them; absent on designs stored before it */
  tieRods: z.object({ count: z.int(), diameter_m: num }).optional(),
  /** total over all shells */
  area_m2: num,
  requiredLength_m: num,
  overSurface_pct: num,
  cost: num,
  rating: rateResultSchema,
});
export type Design = z.infer<typeof designSchema>;

export const sizeResultSchema = z.object({
  recommended: designSchema,
  candidates: z.array(designSchema),
  evaluated: z.int(),
  feasible: z.int(),
  warnings: z.array(warningSchema),
  /** issue 11: the recommended design under the design point and each operating case */
  cases: z.array(caseResultSchema).optional(),
  governingCase: z.string().optional(),
});
export type SizeResult = z.infer<typeof sizeResultSchema>;
