/**
 * The workspace's geometry editor: the engineer's bundle, rated in the browser on every change with
 * the same engine the server uses (`evaluateDesign`, a few ms), and priced by the server's preview
 * (debounced; nothing saved) so the price follows the geometry without a request per keystroke.
 */
import { computed, reactive, ref, watch, type Ref } from 'vue';
import type { Price } from '@shared/schemas/price-book';
import type { DesignEdit } from '@shared/schemas/quotes';
import type { Design, SizeRequest } from '@shared/schemas/thermal';
import { evaluateDesign } from '@shared/thermal/evaluate';
import { STANDARD_SHELLS } from '@shared/thermal/geometry/shells';
import { tubeSizeOf } from '@shared/thermal/geometry/tubes';
import { errorMessage } from '../api/http';
import { previewQuoteChange } from '../api/quotes';
import { readDesign, type ProcessSide } from '../views/sizing/parts/design-words';

/** The editable bundle: a quote's design edit plus the allocation, the shells in series and the baffle cut. */
export type Geometry = DesignEdit & { processSide?: ProcessSide; shellsInSeries?: number; baffleCut?: number };

/**
 * The editable part of a design (a wall-cooled design has no shell: the smallest pipe shell stands
 * in). Designs stored before engine v2 read as process in the tubes, one shell, 25 % cut and the
 * old default spacing, so opening one shows no change until the engineer makes one.
 */
export function geometryOf(d: Omit<Design, 'rating'>): Geometry {
  const v = readDesign(d);
  return {
    tubeCount: d.tubeCount,
    tubeLength_m: d.tubeLength_m,
    tubeOuterDiameter_m: d.tubeOuterDiameter_m,
    tubeWall_m: d.tubeWall_m,
    tubeMaterial: d.tubeMaterial,
    tubePasses: d.tubePasses,
    layout: d.layout ?? 30,
    shellInnerDiameter_m: d.shellInnerDiameter_m ?? STANDARD_SHELLS[0]!.innerDiameter_m,
    ...(v.baffleSpacing_m ? { baffleSpacing_m: v.baffleSpacing_m } : {}),
    processSide: v.processSide,
    shellsInSeries: v.shellsInSeries,
    baffleCut: v.baffleCut,
  };
}

/** equal whatever order the keys were set in (a field deleted and set again moves to the end) */
const canon = (g: Geometry) => JSON.stringify(Object.entries(g).filter(([, v]) => v !== undefined).sort(([a], [b]) => a.localeCompare(b)));
const same = (a: Geometry, b: Geometry) => canon(a) === canon(b);

export function useReviewGeometry(quoteId: () => string, duty: Ref<SizeRequest | null>) {
  const model = reactive<Geometry>({
    tubeCount: 1,
    tubeLength_m: 1,
    tubeOuterDiameter_m: 0.019,
    tubeWall_m: 0.0016,
    tubeMaterial: 'carbon-steel',
    tubePasses: 1,
    layout: 30,
    shellInnerDiameter_m: 0.2,
  });
  /** the saved geometry the edits are measured against */
  const baseline = ref<Geometry | null>(null);

  function setFrom(design: Omit<Design, 'rating'>, asBaseline = false): void {
    const g = geometryOf(design);
    if (g.baffleSpacing_m === undefined) delete model.baffleSpacing_m;
    Object.assign(model, g);
    if (asBaseline) baseline.value = g;
  }

  const changed = computed(() => baseline.value !== null && !same({ ...model }, baseline.value));
  /** a wall (bath) boundary has no shell side: the process stays in the tubes, no baffles, one unit */
  const hasShell = computed(() => duty.value?.boundary.kind !== 'wall');
  const walls = computed(() => tubeSizeOf(model.tubeOuterDiameter_m)?.walls ?? []);

  /** keeps the wall valid when the OD changes: the same gauge if offered, else the catalogue's middle one */
  watch(
    () => model.tubeOuterDiameter_m,
    () => {
      const offered = walls.value;
      if (offered.length && !offered.some((w) => Math.abs(w.wall_m - model.tubeWall_m) < 2e-5)) {
        model.tubeWall_m = offered[Math.floor(offered.length / 2)]!.wall_m;
      }
    },
  );

  const rating = computed<{ design: Design | null; error: string | null }>(() => {
    if (!duty.value) return { design: null, error: null };
    try {
      return { design: evaluateDesign(duty.value, { ...model }), error: null };
    } catch (error) {
      return { design: null, error: error instanceof Error ? error.message : 'This geometry cannot be rated.' };
    }
  });

  const price = ref<Price | null>(null);
  const priceError = ref<string | null>(null);
  const pricing = ref(false);
  let timer: ReturnType<typeof setTimeout> | undefined;
  let ticket = 0;
  watch(
    () => JSON.stringify(model),
    () => {
      clearTimeout(timer);
      if (!changed.value || rating.value.error) {
        price.value = null;
        priceError.value = null;
        pricing.value = false;
        return;
      }
      pricing.value = true;
      timer = setTimeout(async () => {
        const mine = ++ticket;
        try {
          const answer = await previewQuoteChange(quoteId(), { design: { ...model } });
          if (mine === ticket) (price.value = answer.price), (priceError.value = null);
        } catch (error) {
          if (mine === ticket) (price.value = null), (priceError.value = errorMessage(error));
        } finally {
          if (mine === ticket) pricing.value = false;
        }
      }, 400);
    },
  );

  return { model, baseline, changed, hasShell, walls, rating, price, priceError, pricing, setFrom };
}

export type ReviewGeometry = ReturnType<typeof useReviewGeometry>;
