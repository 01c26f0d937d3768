/**
 * Request and result shapes of `POST /api/thermal/rate` and `POST /api/thermal/size` (issue 3).
 * All SI. These schemas reject malformed input (HTTP 400 naming the field); physically impossible
 * but well-formed input (zero or negative flows, a target past the coolant, water above boiling…)
 * passes here and is refused by the engine with a ThermalInputError (HTTP 422).
 */
import { z } from 'zod';
import { correlationChoices } from '../thermal/correlations/select';
import { fluidIds } from '../thermal/fluids/registry';
import { tubeMaterialIds } from '../thermal/geometry/materials';

const num = z.number();
const positive = z.number().positive();
const nonNegative = z.number().nonnegative();

export const fluidIdSchema = z.enum(fluidIds);

/** A customer's own constant properties, SI. */
export const constantFluidSchema = z.object({
  constant: z.object({ density: positive, specificHeat: positive, viscosity: positive, conductivity: positive }),
});

export const fluidRefSchema = z.union([fluidIdSchema, constantFluidSchema]);
export type FluidRef = z.infer<typeof fluidRefSchema>;

/** Intake air of a compressor (`air-moist`): sets the water the air carries. */
export const intakeSchema = z.object({
  temp_C: num,
  /** 0…1 */
  relativeHumidity: z.number().min(0).max(1),
  pressure_Pa: positive,
});

/** The stream inside the tubes. `pressure_Pa` absolute. */
export const processStreamSchema = z.object({
  fluid: fluidRefSchema,
  pressure_Pa: positive,
  massFlow_kg_s: num,
  inletTemp_C: num,
  intake: intakeSchema.optional(),
});

export const layoutSchema = z.union([z.literal(30), z.literal(60), z.literal(90), z.literal(45)]);

export const wallBoundarySchema = z.object({ kind: z.literal('wall'), wallTemp_C: num });

export const coolantBoundarySchema = z.object({
  kind: z.literal('coolant'),
  fluid: fluidRefSchema,
  pressure_Pa: positive,
  massFlow_kg_s: num,
  inletTemp_C: num,
  shellInnerDiameter_m: positive.optional(),
  baffleSpacing_m: positive.optional(),
  /** fraction of the shell diameter, 0.15–0.45 */
  baffleCut: z.number().min(0.15).max(0.45).optional(),
  tubePitch_m: positive.optional(),
  layout: layoutSchema.optional(),
  foulingInside_m2K_W: nonNegative.optional(),
  foulingOutside_m2K_W: nonNegative.optional(),
});

export const boundarySchema = z.discriminatedUnion('kind', [wallBoundarySchema, coolantBoundarySchema]);

const tubePasses = z
  .int()
  .min(1)
  .max(8)
  .refine((n) => n === 1 || n % 2 === 0, { error: 'Tube passes must be 1 or an even number up to 8.' });

export const geometrySchema = z
  .object({
    tubeOuterDiameter_m: positive,
    tubeWall_m: positive,
    tubeCount: z.int().positive(),
    tubeLength_m: positive,
    tubePasses,
    roughness_m: nonNegative.default(1.5e-6),
    tubeMaterial: z.enum(tubeMaterialIds).default('carbon-steel'),
    /** optional tube-side nozzle bore, m: adds nozzle losses to the pressure drop */
    nozzleDiameter_m: positive.optional(),
  })
  .refine((g) => g.tubeWall_m < g.tubeOuterDiameter_m / 2, { error: 'The tube wall must be thinner than half the outside diameter.', path: ['tubeWall_m'] })
  .refine((g) => g.tubeCount % g.tubePasses === 0, { error: 'The tube count must divide evenly among the tube passes.', path: ['tubeCount'] });

export const correlationSchema = z.enum(correlationChoices).default('auto');

export const rateRequestSchema = z.object({
  process: processStreamSchema,
  boundary: boundarySchema,
  geometry: geometrySchema,
  correlation: correlationSchema,
});
export type RateRequest = z.infer<typeof rateRequestSchema>;
export type RateRequestInput = z.input<typeof rateRequestSchema>;

export const sizeConstraintsSchema = z.object({
  maxTubeLength_m: positive,
  maxPressureDrop_Pa: positive,
  maxShellPressureDrop_Pa: positive.optional(),
  tubeOuterDiameters_m: z.array(positive).min(1).optional(),
  materials: z.array(z.enum(tubeMaterialIds)).min(1).optional(),
  tubePasses: z.array(tubePasses).min(1).optional(),
  layouts: z.array(layoutSchema).min(1).optional(),
  foulingInside_m2K_W: nonNegative.optional(),
  foulingOutside_m2K_W: nonNegative.optional(),
  maxShellInnerDiameter_m: positive.optional(),
  /** shop's length increment, m (default 0.1) */
  lengthStep_m: positive.optional(),
});

export const sizeRequestSchema = z.object({
  process: processStreamSchema.extend({ outletTemp_C: num }),
  boundary: boundarySchema,
  constraints: sizeConstraintsSchema,
  correlation: correlationSchema,
});
export type SizeRequest = z.infer<typeof sizeRequestSchema>;
export type SizeRequestInput = z.input<typeof sizeRequestSchema>;

// ---- results ----

export const warningSchema = z.object({ code: z.string(), message: z.string() });

export const profilePointSchema = z.object({ x_m: num, process_C: num, coolant_C: num.optional() });

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
});
export type RateResult = z.infer<typeof rateResultSchema>;

export const designSchema = z.object({
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
});
export type SizeResult = z.infer<typeof sizeResultSchema>;
