import { z } from 'zod';
import { publicVessel } from './vessels.js';

export const visitSite = z
  .object({ organisationName: z.string(), vessels: z.array(publicVessel) })
  .meta({ id: 'VisitSite' });
export type VisitSite = z.infer<typeof visitSite>;
