import { useToast } from 'primevue/usetoast';
import { errorText } from '@/utils/error-text';

/** Short toasts for the outcome of an action. */
export function useNotify() {
  const toast = useToast();
  return {
    done(summary: string, detail?: string) {
      toast.add({ severity: 'success', summary, detail, life: 4000 });
    },
    failed(err: unknown, summary = 'That did not work') {
      toast.add({ severity: 'error', summary, detail: errorText(err), life: 7000 });
    },
  };
}
