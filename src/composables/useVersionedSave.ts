import { ref } from 'vue';
import { ApiRequestError } from '@/api/client';
import type { useFieldErrors } from '@/composables/useFieldErrors';

/** Saves a versioned record: `submit` runs `save` and passes its result to `saved`; a stale-version 409 sets `conflict`, and `reload` refills the form. */
export function useVersionedSave<T>(
  errors: ReturnType<typeof useFieldErrors>,
  options: { save: () => Promise<T | null>; saved: (result: T) => void; reload: () => Promise<void> },
) {
  const conflict = ref(false);
  const reloading = ref(false);

  async function submit() {
    try {
      const result = await options.save();
      if (result === null) return;
      options.saved(result);
    } catch (err) {
      errors.take(err);
      conflict.value = err instanceof ApiRequestError && err.status === 409 && 'version' in err.fields;
    }
  }

  async function reload() {
    reloading.value = true;
    try {
      await options.reload();
    } catch (err) {
      errors.take(err);
    } finally {
      reloading.value = false;
    }
  }

  return { submit, reload, conflict, reloading };
}
