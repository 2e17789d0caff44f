import type { UnitSystem } from '@shared/schemas/settings';
import { useQuery } from '@pinia/colada';
import { computed } from 'vue';
import { fetchSettings } from '@/api/admin';

/** The organisation's choice of US customary or metric units (US customary until the settings arrive). */
export function useUnitSystem() {
  const settings = useQuery({ key: ['settings'], query: fetchSettings, staleTime: 5 * 60_000 });
  return computed<UnitSystem>(() => settings.data.value?.unitSystem ?? 'us-customary');
}
