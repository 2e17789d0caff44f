import { DEFAULT_RISK_SCALE, type RiskScale } from '@shared/calc/abc-risk';
import { useQuery } from '@pinia/colada';
import { computed } from 'vue';
import { fetchSettings } from '@/api/admin';

/** The organisation's ABC anchors and priority bands (the defaults until the settings arrive). */
export function useRiskScale() {
  const settings = useQuery({ key: ['settings'], query: fetchSettings, staleTime: 5 * 60_000 });
  return computed<RiskScale>(() => settings.data.value?.riskScale ?? DEFAULT_RISK_SCALE);
}
