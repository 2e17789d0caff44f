import { onScopeDispose, ref, watch, type Ref } from 'vue';

/** A copy of `source` that follows it once it has stopped changing for `delay` ms. */
export function useDebounced<T>(source: Ref<T>, delay = 300): Ref<T> {
  const debounced = ref(source.value) as Ref<T>;
  let timer: ReturnType<typeof setTimeout> | undefined;
  watch(source, (value) => {
    clearTimeout(timer);
    timer = setTimeout(() => (debounced.value = value), delay);
  });
  onScopeDispose(() => clearTimeout(timer));
  return debounced;
}
