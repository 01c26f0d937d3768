/**
 * "Request this design" (issue 12): the sizing page hands the duty as typed (the form's model, in the
 * user's units) and the design picked to the new-request page, through the tab's session storage so
 * that a guest's detour through sign-in keeps it. Taken once: a later visit starts empty.
 */
import type { ChosenDesign } from '@shared/schemas/quotes';
import type { Design } from '@shared/schemas/thermal';

const KEY = 'bundlesmith.requestDesign';

export interface Handoff {
  /** the duty form's model (plain data) */
  model: Record<string, unknown>;
  chosen: ChosenDesign;
}

/** The geometry that names a design (what the server matches or rates as given). */
export function designKey(d: Design): ChosenDesign {
  const key: ChosenDesign = {
    tubeCount: d.tubeCount,
    tubeLength_m: d.tubeLength_m,
    tubeOuterDiameter_m: d.tubeOuterDiameter_m,
    tubeWall_m: d.tubeWall_m,
    tubeMaterial: d.tubeMaterial as ChosenDesign['tubeMaterial'],
    tubePasses: d.tubePasses,
    ...(d.layout !== undefined ? { layout: d.layout } : {}),
    ...(d.shellInnerDiameter_m !== undefined ? { shellInnerDiameter_m: d.shellInnerDiameter_m } : {}),
    ...(d.baffleSpacing_m !== undefined ? { baffleSpacing_m: d.baffleSpacing_m } : {}),
    ...(d.processSide !== undefined ? { processSide: d.processSide } : {}),
    ...(d.shellsInSeries !== undefined ? { shellsInSeries: d.shellsInSeries } : {}),
    ...(d.baffleCut !== undefined ? { baffleCut: d.baffleCut } : {}),
  };
  return key;
}

/** Same geometry and length as the key (the server's own test is `sameDesign`). */
export function matchesKey(d: Design, k: ChosenDesign): boolean {
  const a = designKey(d);
  const close = (x: unknown, y: unknown) => (typeof x === 'number' && typeof y === 'number' ? Math.abs(x - y) <= 1e-9 * Math.max(1, Math.abs(x)) : x === y);
  const keys = new Set([...Object.keys(a), ...Object.keys(k)]) as Set<keyof ChosenDesign>;
  return [...keys].every((key) => close(a[key], k[key]));
}

export function saveHandoff(h: Handoff): void {
  sessionStorage.setItem(KEY, JSON.stringify(h));
}

export function takeHandoff(): Handoff | null {
  const raw = sessionStorage.getItem(KEY);
  sessionStorage.removeItem(KEY);
  if (!raw) return null;
  try {
    const h = JSON.parse(raw) as Handoff;
    return h && typeof h.model === 'object' && typeof h.chosen === 'object' ? h : null;
  } catch {
    return null;
  }
}

function isPlain(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/**
 * Writes a saved model into the live form model in place (components hold references to its inner
 * objects); quantities ({kind, value, unit}) and lists are replaced whole, keys the form lacks ignored.
 */
export function restoreModel(target: Record<string, unknown>, saved: Record<string, unknown>): void {
  for (const [key, value] of Object.entries(saved)) {
    if (!(key in target)) continue;
    const current = target[key];
    if (isPlain(current) && isPlain(value) && !('kind' in current)) restoreModel(current, value);
    else target[key] = value;
  }
}
