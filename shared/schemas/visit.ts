import { z } from 'zod';
import { publicClosure } from './incidents.js';
import { publicVessel } from './vessels.js';

export const visitSite = z
  .object({ organisationName: z.string(), vessels: z.array(publicVessel.extend({ closures: z.array(publicClosure) })) })
  .meta({ id: 'VisitSite' });
export type VisitSite = z.infer<typeof visitSite>;
