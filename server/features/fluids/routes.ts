import { Router } from 'express';
import { z } from 'zod';
import { getFluid, isFluidId, listFluids, parseGlycolId, unknownFluidProblem } from '../../../shared/thermal/fluids';
import { notFound, unprocessable } from '../../lib/errors';
import { parse } from '../../lib/validate';

const finite = (what: string) =>
  z.coerce.number({ error: `${what} must be a number` }).refine(Number.isFinite, `${what} must be a finite number`);

const propertiesQuery = z.object({
  temp_C: finite('temp_C'),
  /** absolute pressure; one standard atmosphere when omitted */
  pressure_Pa: finite('pressure_Pa').refine((p) => p > 0, 'pressure_Pa must be above zero (absolute)').default(101_325),
});

/** The fluid library (public): what fluids there are and their properties at a state. */
export function fluidsRouter(): Router {
  const r = Router();
  r.get('/', (_req, res) => {
    res.json({ items: listFluids() });
  });
  r.get('/:id/properties', (req, res) => {
    const id = String(req.params.id);
    if (!isFluidId(id)) {
      // a glycol–water id whose strength is outside 10–60 % or off the 5 % steps: say so (422 on `id`)
      if (parseGlycolId(id)) {
        const why = unknownFluidProblem(id)!;
        throw unprocessable(why, 'fluid-range', { id: why });
      }
      throw notFound(`No fluid '${id}' in the library; GET /api/fluids lists them.`);
    }
    const { temp_C, pressure_Pa } = parse(propertiesQuery, req.query, 'query');
    const p = getFluid(id).properties(temp_C, pressure_Pa); // outside its data: ThermalInputError → 422
    res.json({
      fluid: id,
      temp_C,
      pressure_Pa,
      density: p.density,
      specificHeat: p.specificHeat,
      viscosity: p.viscosity,
      conductivity: p.conductivity,
      prandtl: p.prandtl,
    });
  });
  return r;
}
