import { parseNavyDesignation } from '../../shared/calc/designation.js';
import { designationQuery, designationResponse } from '../../shared/schemas/calc.js';
import type { ApiRouter } from '../http/api-router.js';
import { anyone } from '../http/access.js';
import { UnprocessableError } from '../http/errors.js';

const NAVY_SOURCE = 'US Navy compartment numbering for ships built after March 1949 (NAVEDTRA 14325, Basic Military Requirements, ch. 8)';

/** Pure computations of shared/calc, served for integrations; they read no records. */
export function calcRoutes(api: ApiRouter) {
  api.route({
    method: 'get',
    path: '/calc/designation',
    tag: 'Calculations',
    summary: 'Parse a compartment designation and explain it in words, or say which part is wrong',
    access: anyone,
    query: designationQuery,
    response: designationResponse,
    errors: [422],
    handler: ({ query }) => {
      const result = parseNavyDesignation(query.value);
      if (!result.ok) throw new UnprocessableError(result.message, { [result.part]: result.message });
      return { scheme: query.scheme, ...result.designation, source: NAVY_SOURCE };
    },
  });
}
