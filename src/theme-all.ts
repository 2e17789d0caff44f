import { updatePreset } from '@primeuix/themes';
import Aura from '@primeuix/themes/aura';

let added = false;

/** Adds every Aura component's design tokens to the theme (the entry has only the public pages' ones). */
export function addAllComponentTokens() {
  if (added) return;
  updatePreset({ components: Aura.components });
  added = true;
}
