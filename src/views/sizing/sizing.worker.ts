/**
 * Live preview of the sizing page: runs the shared engine's `size()` off the main thread, so typing
 * never waits for a search of a few thousand candidates. Answers only what the preview shows.
 */
import type { SizeRequestInput } from '@shared/schemas/thermal';
import { size, ThermalInputError } from '@shared/thermal';

export interface PreviewRequest {
  id: number;
  input: SizeRequestInput;
}

export interface PreviewSummary {
  tubeCount: number;
  tubeLength_m: number;
  tubeOuterDiameter_m: number;
  tubeWallLabel: string;
  tubePasses: number;
  processSide: 'tubes' | 'shell';
  shellsInSeries: number;
  outletTemp_C: number;
  coolantOutletTemp_C?: number;
  duty_W: number;
  feasible: number;
  elapsed_ms: number;
}

export type PreviewReply =
  | { id: number; ok: true; summary: PreviewSummary }
  | { id: number; ok: false; message: string; field?: string };

self.onmessage = (event: MessageEvent<PreviewRequest>) => {
  const { id, input } = event.data;
  const started = performance.now();
  let reply: PreviewReply;
  try {
    const result = size(input);
    const d = result.recommended;
    reply = {
      id,
      ok: true,
      summary: {
        tubeCount: d.tubeCount,
        tubeLength_m: d.tubeLength_m,
        tubeOuterDiameter_m: d.tubeOuterDiameter_m,
        tubeWallLabel: d.tubeWallLabel,
        tubePasses: d.tubePasses,
        processSide: d.processSide ?? 'tubes',
        shellsInSeries: d.shellsInSeries ?? 1,
        outletTemp_C: d.rating.outletTemp_C,
        coolantOutletTemp_C: d.rating.coolantOutletTemp_C,
        duty_W: d.rating.duty_W,
        feasible: result.feasible,
        elapsed_ms: performance.now() - started,
      },
    };
  } catch (error) {
    if (!(error instanceof ThermalInputError)) console.error('[sizing preview]', error);
    reply =
      error instanceof ThermalInputError
        ? { id, ok: false, message: error.message, field: error.field }
        : { id, ok: false, message: 'The preview could not compute this duty; “Size it” asks the server.' };
  }
  self.postMessage(reply);
};
