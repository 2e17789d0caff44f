import { useQuery } from '@pinia/colada';
import { fetchVisitSite } from '@/api/vessels';

/** What the public site shows; the layout and the pages share one request. */
export function useVisitSite() {
  return useQuery({ key: ['visit-site'], query: fetchVisitSite });
}
