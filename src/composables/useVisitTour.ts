import { useQuery } from '@pinia/colada';
import { computed, type Ref } from 'vue';
import { fetchPublicTour } from '@/api/visit-tours';
import { ApiRequestError } from '@/api/client';

/** A published tour; the tour page and its stops share one request. */
export function useVisitTour(slug: Ref<string>) {
  const tour = useQuery({ key: () => ['visit-tour', slug.value], query: () => fetchPublicTour(slug.value) });
  const missing = computed(() => tour.error.value instanceof ApiRequestError && tour.error.value.status === 404);
  return { tour, missing };
}
