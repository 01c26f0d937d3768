/**
 * Hard findings in the review workspace (issue 12): the same list the server refuses with
 * (shared/thermal/checks/hard-findings.ts), under the shop's limits from the active price book.
 * The limits are read once per page; until they arrive the geometric findings still show.
 */
import { computed, onMounted, ref, type Ref } from 'vue';
import { hardFindings, type HardInput } from '@shared/thermal/checks/hard-findings';
import type { ThermalWarning } from '@shared/thermal/errors';
import type { ShopLimits } from '@shared/thermal/shop-limits';
import { fetchShopLimits } from '../api/quotes';

export function useHardFindings(saved: Ref<HardInput | null | undefined>, live: Ref<HardInput | null | undefined>) {
  const limits = ref<ShopLimits | undefined>();
  onMounted(async () => {
    try {
      limits.value = await fetchShopLimits();
    } catch {
      // without the limits the geometric findings still show; the server decides on save either way
    }
  });
  const of = (d: HardInput | null | undefined): ThermalWarning[] => (d ? hardFindings(d, limits.value) : []);
  return { saved: computed(() => of(saved.value)), live: computed(() => of(live.value)) };
}
