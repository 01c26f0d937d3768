/**
 * A sales engineer's design edit carries engine v2's choices: which side the process goes, shells in
 * series and the baffle cut. Before, the edit schema dropped them silently and the saved revision
 * came back as the process in the tubes, one shell, whatever was sent.
 */
import { afterAll, beforeAll, expect, it } from 'vitest';
import { signedIn, startTestApp, type TestApp } from './support/app';
import { createQuote } from './support/quotes';

let t: TestApp;
let pellmar: Awaited<ReturnType<typeof signedIn>>;
let sales: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  t = await startTestApp();
  [pellmar, sales] = await Promise.all([signedIn(t.app, 'customer@pellmar.example'), signedIn(t.app, 'sales@aldercreek.example')]);
});
afterAll(() => t.close());

function editOf(d: Record<string, unknown>) {
  const { tubeCount, tubeLength_m, tubeOuterDiameter_m, tubeWall_m, tubeMaterial, tubePasses, layout, shellInnerDiameter_m } = d;
  return { tubeCount, tubeLength_m, tubeOuterDiameter_m, tubeWall_m, tubeMaterial, tubePasses, layout, shellInnerDiameter_m };
}

it('saves the process side, shells in series, baffle spacing and cut of an edited design, and rates with them', async () => {
  const q = await createQuote(pellmar);
  const d = q.revision.design;
  const side = d.processSide === 'shell' ? 'tubes' : 'shell';
  const edit = { ...editOf(d), processSide: side, shellsInSeries: 2, baffleSpacing_m: 0.2, baffleCut: 0.3 };

  const preview = await sales.post(`/api/quotes/${q.id}/preview`).send({ design: edit });
  expect(preview.status).toBe(200);
  expect(preview.body.design).toMatchObject({ processSide: side, shellsInSeries: 2, baffleCut: 0.3 });
  const res = await sales.patch(`/api/quotes/${q.id}`).send({ version: q.version, design: edit });
  expect(res.status).toBe(200);
  const saved = res.body.revision.design;
  expect(saved).toMatchObject({ processSide: side, shellsInSeries: 2, baffleSpacing_m: 0.2, baffleCut: 0.3 });
  expect(saved.rating).toMatchObject({ processSide: side, shellsInSeries: 2 });
  // two shells of the same bundle: twice the area of one (area_m2 counts every shell)
  expect(saved.area_m2 / (d.area_m2 as number)).toBeCloseTo(2, 1);
});

it('refuses a shell count outside 1-4 and a cut outside 15-45 %, naming the field', async () => {
  const q = await createQuote(pellmar);
  for (const [field, value] of [['shellsInSeries', 5], ['baffleCut', 0.6]] as const) {
    const res = await sales.patch(`/api/quotes/${q.id}`).send({ version: q.version, design: { ...editOf(q.revision.design), [field]: value } });
    expect(res.status, field).toBe(400);
    expect(Object.keys(res.body.error.fields ?? {}).join(' ')).toContain(`design.${field}`);
  }
});
