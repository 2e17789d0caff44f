import type { ArtifactCategory, ArtifactStatus } from '@shared/schemas/artifacts';

/** The PrimeIcons glyph inside an artifact's badge on the deck map, one per category. */
export const CATEGORY_ICON: Record<ArtifactCategory, string> = {
  propulsion: 'pi-sync',
  'boilers-and-steam': 'pi-cloud',
  'auxiliary-machinery': 'pi-cog',
  'pumps-and-piping': 'pi-arrow-right-arrow-left',
  'valves-and-fittings': 'pi-wrench',
  electrical: 'pi-bolt',
  'instruments-and-gauges': 'pi-gauge',
  tools: 'pi-hammer',
  furnishings: 'pi-box',
  'documents-and-signage': 'pi-file',
  other: 'pi-tag',
};

/**
 * How a badge shows its status besides the words: a filled badge is aboard where it belongs; a
 * gold ring is on display; a hollow one is stored, with a double ring under treatment; a dashed ring
 * is away on loan; a red dotted ring is missing.
 */
export const MARKER_STATUS_PATTERN: Record<ArtifactStatus, string> = {
  'in-place': 'filled badge',
  'on-display': 'filled badge with a gold ring',
  'under-treatment': 'hollow badge with a double ring',
  'in-store': 'hollow badge',
  'on-loan': 'dashed ring',
  missing: 'red dotted ring',
  deaccessioned: 'grey badge',
};

export const STATUS_SEVERITY: Record<ArtifactStatus, 'success' | 'info' | 'warn' | 'danger' | 'secondary'> = {
  'in-place': 'success',
  'on-display': 'success',
  'under-treatment': 'warn',
  'in-store': 'info',
  'on-loan': 'warn',
  missing: 'danger',
  deaccessioned: 'secondary',
};
