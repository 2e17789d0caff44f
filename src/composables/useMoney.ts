import { formatDecimal } from '@shared/calc/estimate';
import { useQuery } from '@pinia/colada';
import { computed } from 'vue';
import { fetchSettings } from '@/api/admin';

/** The currency's symbol as the browser writes it ("$", "€", or the code). */
function symbolOf(currency: string): string {
  try {
    return new Intl.NumberFormat(undefined, { style: 'currency', currency }).formatToParts(0).find((p) => p.type === 'currency')?.value ?? currency;
  } catch {
    return currency;
  }
}

/** Writes integer cents in the organisation's currency, from the digits (never through a float). */
export function useMoney() {
  const settings = useQuery({ key: ['settings'], query: fetchSettings, staleTime: 5 * 60_000 });
  const currency = computed(() => settings.data.value?.currency ?? 'USD');
  const symbol = computed(() => symbolOf(currency.value));
  const format = (cents: number) => `${symbol.value}${formatDecimal(cents, 2, 2)}`;
  return { currency, symbol, format };
}
