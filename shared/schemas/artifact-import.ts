import { z } from 'zod';

/** The columns of an artifact CSV, in order; export writes them and import reads them by header. */
export const ARTIFACT_CSV_COLUMNS = [
  { name: 'object_number', required: true, help: 'Unique on this vessel; must follow the organisation’s pattern (by default YYYY.N.N, e.g. 2019.4.12).' },
  { name: 'name', required: true, help: 'Up to 160 characters.' },
  { name: 'category', required: true, help: 'One of the category codes listed below.' },
  { name: 'description', required: false, help: 'Free text.' },
  { name: 'date_or_period', required: false, help: 'Free text, e.g. 1923 or c. 1920–1930.' },
  { name: 'maker', required: false, help: 'Free text.' },
  { name: 'materials', required: false, help: 'Free text, e.g. cast iron; brass.' },
  { name: 'height', required: false, help: 'A number, in the dimension unit.' },
  { name: 'width', required: false, help: 'A number, in the dimension unit.' },
  { name: 'depth', required: false, help: 'A number, in the dimension unit.' },
  { name: 'dimension_unit', required: false, help: 'mm, cm, m, in or ft; cm when empty.' },
  { name: 'significance', required: false, help: 'Free text.' },
  { name: 'status', required: false, help: 'in-place, in-store, on-loan or missing; in-place when empty.' },
  { name: 'compartment', required: false, help: 'The designation of a compartment of this vessel, e.g. 3-110-2-E; empty when not aboard.' },
  { name: 'deck', required: false, help: 'Written on export for reading; ignored on import (the compartment gives the deck).' },
] as const;
export type ArtifactCsvColumn = (typeof ARTIFACT_CSV_COLUMNS)[number]['name'];

export const IMPORT_MODES = ['preview', 'all', 'valid-only'] as const;
export type ImportMode = (typeof IMPORT_MODES)[number];

export const importQuery = z.object({
  mode: z.enum(IMPORT_MODES, { error: 'Choose preview, all or valid-only.' }).default('preview'),
});

export const importRow = z.object({
  /** Line in the file, counting the header as line 1. */
  line: z.number().int(),
  objectNumber: z.string(),
  name: z.string(),
  errors: z.array(z.object({ column: z.string(), message: z.string() })),
});
export type ImportRow = z.infer<typeof importRow>;

export const importResult = z
  .object({
    mode: z.enum(IMPORT_MODES),
    rows: z.array(importRow),
    total: z.number().int(),
    valid: z.number().int(),
    invalid: z.number().int(),
    imported: z.number().int(),
    /** Problems with the file as a whole (missing columns, unknown columns). */
    fileErrors: z.array(z.string()),
  })
  .meta({ id: 'ArtifactImportResult' });
export type ImportResult = z.infer<typeof importResult>;

/** The most rows one file may carry. */
export const IMPORT_MAX_ROWS = 5000;
