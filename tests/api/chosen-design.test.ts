/**
 * Issue 12, "Request this design": a request may carry the design picked on the sizing page; the
 * quote stores that design when it is still valid (among the designs sized with the price book, or
 * rated as given within the duty, the limits, the design margin and the shop's rules), else the
 * recommended one and the answer says why. The stored duty keeps the flow as given (L/min here).
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedIn, startTestApp, type TestApp } from './support/app';

let t: TestApp;
let pellmar: Awaited<ReturnType<typeof signedIn>>;
beforeAll(async () => {
  t = await startTestApp();
  pellmar = await signedIn(t.app, 'customer@pellmar.example');
});
afterAll(() => t.close());

/** 60 L/min of ISO VG 46 (invented duty), sized with the fabricator's usual 10 % margin as the sizing page sends it. */
const duty = () => ({
  process: { fluid: 'oil-vg46', pressure_Pa: 500000, volumeFlow_m3_s: 0.001, inletTemp_C: 62, outletTemp_C: 47 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 350000, volumeFlow_m3_s: 6 / 3600, inletTemp_C: 27 },
  constraints: { maxTubeLength_m: 3.5, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000, designMargin_pct: 10 },
});

type D = Record<string, unknown> & { tubeCount: number; tubeLength_m: number; shellInnerDiameter_m?: number };
const KEY = ['tubeCount', 'tubeLength_m', 'tubeOuterDiameter_m', 'tubeWall_m', 'tubeMaterial', 'tubePasses', 'layout', 'shellInnerDiameter_m', 'baffleSpacing_m', 'processSide', 'shellsInSeries', 'baffleCut'];
const keyOf = (d: D) => Object.fromEntries(KEY.filter((k) => d[k] !== undefined).map((k) => [k, d[k]]));

describe('POST /api/quotes with chosenDesign', () => {
  let picked: D;
  beforeAll(async () => {
    const sized = await request(t.app).post('/api/thermal/size').send(duty());
    expect(sized.status).toBe(200);
    // the public page's second alternative (its ranking is the cost proxy, the quote's the price book)
    picked = (sized.body.candidates as D[]).find((d) => d.tubeCount !== sized.body.recommended.tubeCount || d.shellInnerDiameter_m !== sized.body.recommended.shellInnerDiameter_m) ?? sized.body.recommended;
  });

  it('stores the design the customer picked, and the duty as given (L/min, not kg/s)', async () => {
    const res = await pellmar.post('/api/quotes').send({ duty: duty(), quantity: 1, chosenDesign: keyOf(picked) });
    expect(res.status).toBe(201);
    expect(res.body.designChoice).toEqual({ kept: true });
    const design = res.body.revision.design as D;
    expect(keyOf(design)).toEqual(keyOf(picked));
    expect(res.body.revision.duty.process.volumeFlow_m3_s).toBe(0.001);
    expect(res.body.revision.duty.process.massFlow_kg_s).toBeUndefined();
  });

  it('a picked design that no longer meets the duty is not stored: the recommended one is, and the answer says why', async () => {
    const short = { ...keyOf(picked), tubeLength_m: Math.max(0.5, Math.round(picked.tubeLength_m * 0.4 * 10) / 10) };
    const res = await pellmar.post('/api/quotes').send({ duty: duty(), quantity: 1, chosenDesign: short });
    expect(res.status).toBe(201);
    expect(res.body.designChoice.kept).toBe(false);
    expect(res.body.designChoice.note).toMatch(/The design you chose no longer does: it cools the process to [\d.]+ °C, not to the target 47 °C\. We stored our recommended design/);
    expect((res.body.revision.design as D).tubeLength_m).not.toBe(short.tubeLength_m);
  });

  it('a malformed chosen design is a 400 naming its field; nothing is stored', async () => {
    const before = (await t.database.pool.query('select count(*)::int as n from quotes')).rows[0].n as number;
    const res = await pellmar.post('/api/quotes').send({ duty: duty(), quantity: 1, chosenDesign: { ...keyOf(picked), tubeCount: 0 } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty(['chosenDesign.tubeCount']);
    expect((await t.database.pool.query('select count(*)::int as n from quotes')).rows[0].n).toBe(before);
  });
});
