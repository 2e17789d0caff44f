import { ref, watch } from 'vue';

/** The visitor's text size: three steps, kept on the phone, applied to the root font size of every public page. */
export const TEXT_SIZES = [
  { id: 'standard', label: 'Standard text', percent: 100 },
  { id: 'large', label: 'Large text', percent: 118.75 },
  { id: 'largest', label: 'Largest text', percent: 137.5 },
] as const;
export type TextSize = (typeof TEXT_SIZES)[number]['id'];

const KEY = 'shipkeeper.visit.text-size';

function stored(): TextSize {
  try {
    const value = localStorage.getItem(KEY);
    return TEXT_SIZES.some((s) => s.id === value) ? (value as TextSize) : 'standard';
  } catch {
    return 'standard';
  }
}

const size = ref<TextSize>(stored());
watch(size, (value) => {
  try {
    localStorage.setItem(KEY, value);
  } catch {
    // private browsing: the size holds for this visit only
  }
});

export function useTextSize() {
  return size;
}

export const textSizePercent = (id: TextSize) => TEXT_SIZES.find((s) => s.id === id)!.percent;
