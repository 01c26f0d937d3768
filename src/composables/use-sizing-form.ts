/**
 * The duty form of the sizing page: what a person types (numbers with units), turned into the SI
 * `SizeRequestInput` of `POST /api/thermal/size` and checked by the shared zod schema through the
 * one form adapter. Unit problems ("that is not a temperature") and empty required fields are found
 * while converting; the schema's rules and the server's 400 field errors come through the adapter.
 * All messages are keyed by the request's dotted field path (`process.massFlow_kg_s`).
 */
import { computed, reactive, ref, watch } from 'vue';
import { sizeRequestSchema, type SizeRequest, type SizeRequestInput } from '@shared/schemas/thermal';
import { DEFAULT_DESIGN_MARGIN_PCT } from '@shared/schemas/price-book';
import { UnitInputError, type UnitSystem } from '@shared/thermal/units';
import { FLOW_FIELDS, flowFields, flowUnit } from '@shared/thermal/flow-units';
import { flowInUnit } from '@shared/thermal/flow-convert';
import type { ApiError } from '../api/http';
import { fetchFluids, type FluidInfo } from '../api/thermal';
import { inUnit, quantity, quantityToSI, switchSystem, tidy, type Quantity } from './use-units';
import { useZodForm } from './use-zod-form';

export const CONSTANT_FLUID = 'constant';

/**
 * The request field a stream's flow fills, by the unit chosen (issue 12): `process.massFlow_kg_s`,
 * `process.volumeFlow_m3_s` or `process.standardVolumeFlow_m3_s`; messages are keyed by it.
 */
export function flowPath(q: Quantity, base: string): string {
  return `${base}.${FLOW_FIELDS[flowUnit(q.unit)?.basis ?? 'mass']}`;
}

/**
 * Defaults: an invented duty, an engine jacket-water loop of 30 % ethylene glycol cooled by plant
 * water, with fouling typical of closed-loop and cooling-tower water (domain brief 2.3, memory).
 */
function defaults() {
  return {
    system: 'SI' as UnitSystem,
    process: {
      fluid: 'ethylene-glycol-30',
      constant: {
        density: quantity('density', 860, 'kg/m^3'),
        specificHeat: quantity('specificHeat', 2.0, 'kJ/(kg K)'),
        viscosity: quantity('viscosity', 15, 'mPa s'),
        conductivity: quantity('conductivity', 0.13, 'W/(m K)'),
      },
      intake: {
        temp: quantity('temperature', 30, 'degC'),
        humidity_pct: 60 as number | null,
        pressure: quantity('pressure', 1.013, 'bar', 'absolute'),
      },
      /** the flow: mass, volume at the inlet or normal/standard volume, by its unit */
      massFlow: quantity('flow', 3.2, 'kg/s'),
      inletTemp: quantity('temperature', 72, 'degC'),
      outletTemp: quantity('temperature', 50, 'degC'),
      pressure: quantity('pressure', 3, 'bar', 'gauge'),
      /** design point for the walls (optional: empty takes the defaults, operating + 10 % and inlet + 25 K) */
      designPressure: quantity('pressure', null, 'bar', 'gauge'),
      designTemp: quantity('temperature', null, 'degC'),
    },
    sink: 'coolant' as 'coolant' | 'wall',
    wallTemp: quantity('temperature', 30, 'degC'),
    coolant: {
      fluid: 'water',
      massFlow: quantity('flow', 4.5, 'kg/s'),
      inletTemp: quantity('temperature', 27, 'degC'),
      pressure: quantity('pressure', 4, 'bar', 'gauge'),
      foulingInside: quantity('fouling', 0.00009, 'm^2 K/W'),
      foulingOutside: quantity('fouling', 0.00018, 'm^2 K/W'),
      designPressure: quantity('pressure', null, 'bar', 'gauge'),
      designTemp: quantity('temperature', null, 'degC'),
    },
    limits: {
      maxTubeLength: quantity('length', 3, 'm'),
      maxPressureDrop: quantity('pressureDrop', 60, 'kPa'),
      maxShellPressureDrop: quantity('pressureDrop', 60, 'kPa'),
      tubeOuterDiameters_m: [] as number[],
      materials: [] as string[],
      tubePasses: [] as number[],
      layouts: [] as number[],
      /**
       * design margin on area, %: the fabricator's usual 10 % (price book default), so the page shows
       * the lengths a quote is sized with (a quote applies at least the book's margin)
       */
      designMargin_pct: DEFAULT_DESIGN_MARGIN_PCT as number | null,
      /** which side the process stream goes on; 'either' lets the engine try both */
      processSide: 'either' as 'either' | 'tubes' | 'shell',
    },
    correlation: 'auto',
  };
}

export type SizingModel = ReturnType<typeof defaults>;

interface Built {
  input: Record<string, unknown>;
  /** unit problems, shown at once */
  problems: Record<string, string>;
  /** required fields left empty, shown once the user has tried to size */
  empties: Record<string, string>;
}

function build(m: SizingModel): Built {
  const problems: Record<string, string> = {};
  const empties: Record<string, string> = {};
  const read = (q: Quantity, path: string, optional = false): number | undefined => {
    if (q.value === null) {
      if (!optional) empties[path] = 'Enter a value.';
      return undefined;
    }
    try {
      return quantityToSI(q);
    } catch (error) {
      problems[path] = error instanceof UnitInputError ? error.message : 'This value cannot be read.';
      return undefined;
    }
  };
  /** a stream's design point: both or neither (neither takes the engine's stated defaults) */
  const designOf = (pq: Quantity, tq: Quantity, base: string) => {
    const pressure_Pa = read(pq, `${base}.design.pressure_Pa`, true);
    const temp_C = read(tq, `${base}.design.temp_C`, true);
    if (pq.value === null && tq.value === null) return undefined;
    if (pq.value === null) empties[`${base}.design.pressure_Pa`] = 'Give the design pressure too, or leave both empty for the defaults.';
    if (tq.value === null) empties[`${base}.design.temp_C`] = 'Give the design temperature too, or leave both empty for the defaults.';
    return { pressure_Pa, temp_C };
  };
  /** a stream's flow as the one request field its unit names (with the reference of a standard flow) */
  const flowOf = (q: Quantity, base: string): Record<string, unknown> => {
    if (q.value === null) {
      empties[flowPath(q, base)] = 'Enter a value.';
      return {};
    }
    if (!flowUnit(q.unit)) {
      problems[flowPath(q, base)] = 'Choose a flow unit from the list.';
      return {};
    }
    return { ...flowFields(q.value, q.unit) };
  };
  const p = m.process;
  const c = p.constant;
  const fluid =
    p.fluid === CONSTANT_FLUID
      ? {
          constant: {
            density: read(c.density, 'process.fluid.constant.density'),
            specificHeat: read(c.specificHeat, 'process.fluid.constant.specificHeat'),
            viscosity: read(c.viscosity, 'process.fluid.constant.viscosity'),
            conductivity: read(c.conductivity, 'process.fluid.constant.conductivity'),
          },
        }
      : p.fluid;
  const process: Record<string, unknown> = {
    fluid,
    pressure_Pa: read(p.pressure, 'process.pressure_Pa'),
    ...flowOf(p.massFlow, 'process'),
    inletTemp_C: read(p.inletTemp, 'process.inletTemp_C'),
    outletTemp_C: read(p.outletTemp, 'process.outletTemp_C'),
    design: designOf(p.designPressure, p.designTemp, 'process'),
  };
  if (p.fluid === 'air-moist') {
    if (p.intake.humidity_pct === null) empties['process.intake.relativeHumidity'] = 'Enter a value.';
    process.intake = {
      temp_C: read(p.intake.temp, 'process.intake.temp_C'),
      relativeHumidity: p.intake.humidity_pct === null ? undefined : p.intake.humidity_pct / 100,
      pressure_Pa: read(p.intake.pressure, 'process.intake.pressure_Pa'),
    };
  }
  const k = m.coolant;
  const boundary =
    m.sink === 'wall'
      ? { kind: 'wall', wallTemp_C: read(m.wallTemp, 'boundary.wallTemp_C') }
      : {
          kind: 'coolant',
          fluid: k.fluid,
          pressure_Pa: read(k.pressure, 'boundary.pressure_Pa'),
          ...flowOf(k.massFlow, 'boundary'),
          inletTemp_C: read(k.inletTemp, 'boundary.inletTemp_C'),
          foulingInside_m2K_W: read(k.foulingInside, 'boundary.foulingInside_m2K_W', true),
          foulingOutside_m2K_W: read(k.foulingOutside, 'boundary.foulingOutside_m2K_W', true),
          design: designOf(k.designPressure, k.designTemp, 'boundary'),
        };
  const l = m.limits;
  const some = <T>(list: T[]): T[] | undefined => (list.length ? [...list] : undefined);
  const constraints = {
    maxTubeLength_m: read(l.maxTubeLength, 'constraints.maxTubeLength_m'),
    maxPressureDrop_Pa: read(l.maxPressureDrop, 'constraints.maxPressureDrop_Pa'),
    maxShellPressureDrop_Pa: m.sink === 'coolant' ? read(l.maxShellPressureDrop, 'constraints.maxShellPressureDrop_Pa', true) : undefined,
    tubeOuterDiameters_m: some(l.tubeOuterDiameters_m),
    materials: some(l.materials),
    tubePasses: some(l.tubePasses),
    layouts: some(l.layouts),
    designMargin_pct: l.designMargin_pct ?? undefined,
    // a wall (bath) keeps the process in the tubes: the choice only exists with a coolant stream
    processSide: m.sink === 'coolant' && l.processSide !== 'either' ? l.processSide : undefined,
  };
  return { input: { process, boundary, constraints, correlation: m.correlation }, problems, empties };
}

/** Drops undefined members so the request body holds only what was given. */
function prune(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(prune);
  if (typeof value !== 'object' || value === null) return value;
  return Object.fromEntries(Object.entries(value).filter(([, v]) => v !== undefined).map(([k, v]) => [k, prune(v)]));
}

export function useSizingForm() {
  const model = reactive(defaults());
  const request = reactive<Record<string, unknown>>({});
  const zod = useZodForm(sizeRequestSchema, request);
  const built = computed(() => build(model));
  const fluids = ref<FluidInfo[]>([]);
  const fluidsError = ref<string | null>(null);

  watch(
    built,
    (b) => {
      for (const key of Object.keys(request)) delete request[key];
      Object.assign(request, prune(b.input));
    },
    { immediate: true },
  );

  function feedback(path: string): string | undefined {
    const b = built.value;
    return b.problems[path] ?? (zod.submitted.value ? b.empties[path] : undefined) ?? zod.feedback(path);
  }

  /** The request when the form is complete and valid, else null (and, on `show`, messages appear). */
  function validate(): SizeRequest | null {
    const parsed = zod.validate();
    const b = built.value;
    return Object.keys(b.problems).length || Object.keys(b.empties).length ? null : parsed;
  }

  /** The request body for the live preview: null while anything is missing or invalid, no messages. */
  const previewInput = computed<SizeRequestInput | null>(() => {
    const b = built.value;
    if (Object.keys(b.problems).length || Object.keys(b.empties).length) return null;
    const parsed = sizeRequestSchema.safeParse(prune(b.input));
    return parsed.success ? (prune(b.input) as SizeRequestInput) : null;
  });

  /**
   * A stream's flow field moved to another unit: within a basis a plain conversion; between mass,
   * volume and normal/standard volume through the fluid's density at the stream's inlet state (the
   * engine's own conversion); empty when the stream is not complete enough to know its density.
   */
  function flowToUnit(stream: 'process' | 'boundary', unit: string): void {
    const target = stream === 'process' ? model.process : model.coolant;
    const q = target.massFlow;
    const same = flowUnit(q.unit)?.basis === flowUnit(unit)?.basis;
    if (same || q.value === null) {
      target.massFlow = inUnit(q, unit);
      return;
    }
    const s = built.value.input[stream] as Record<string, unknown> | undefined;
    const ready = s && s.fluid !== undefined && typeof s.inletTemp_C === 'number' && typeof s.pressure_Pa === 'number';
    const v = ready ? flowInUnit(s as Parameters<typeof flowInUnit>[0], q.value, q.unit, unit) : null;
    target.massFlow = { ...q, unit, value: v === null ? null : tidy(v) };
  }

  function setSystem(system: UnitSystem): void {
    model.system = system;
    switchSystem(model as unknown as Record<string, unknown>, system);
  }

  async function loadFluids(): Promise<void> {
    try {
      fluids.value = await fetchFluids();
    } catch {
      fluidsError.value = 'The fluid list could not be loaded; reload the page to try again.';
    }
  }

  return {
    model,
    fluids,
    fluidsError,
    previewInput,
    feedback,
    status: (path: string) => (feedback(path) ? ('error' as const) : undefined),
    validate,
    applyServerError: (error: ApiError) => zod.applyServerError(error),
    setSystem,
    flowToUnit,
    loadFluids,
  };
}

export type SizingForm = ReturnType<typeof useSizingForm>;
