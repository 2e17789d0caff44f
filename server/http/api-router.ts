import { Router, type Request, type RequestHandler, type Response } from 'express';
import { z } from 'zod';
import { errorEnvelope } from '../../shared/schemas/common.js';
import { authorize, type Access } from './access.js';
import { isInvalidCharactersIssue } from '../../shared/schemas/text.js';
import { InvalidCharactersError, ValidationError } from './errors.js';
import { fieldsFromZodError } from './zod-fields.js';

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

export interface HandlerContext<P, Q, B> {
  params: P;
  query: Q;
  body: B;
  req: Request;
  res: Response;
}

export interface RouteSpec<P extends z.ZodType = z.ZodType, Q extends z.ZodType = z.ZodType, B extends z.ZodType = z.ZodType> {
  method: Method;
  /** Express path below /api/v1, e.g. `/users/:id`. */
  path: string;
  tag: string;
  summary: string;
  access: Access;
  params?: P;
  query?: Q;
  body?: B;
  /** Status of a successful answer; 204 sends no body. */
  status?: number;
  response?: z.ZodType;
  /** Content type of a non-JSON answer, for the OpenAPI document. */
  produces?: string;
  /** Error statuses this route can answer besides 401/403/400. */
  errors?: number[];
  /** Runs after validation, before the handler (rate limits). */
  before?: RequestHandler[];
  handler: (ctx: HandlerContext<z.output<P>, z.output<Q>, z.output<B>>) => unknown;
}

function parse<T extends z.ZodType>(schema: T | undefined, value: unknown, where: string): z.output<T> | undefined {
  if (!schema) return undefined;
  const result = schema.safeParse(value ?? {});
  if (!result.success) {
    const fields = fieldsFromZodError(result.error);
    const refused = result.error.issues.filter(isInvalidCharactersIssue);
    if (refused.length === 1) throw new InvalidCharactersError(refused[0]!.message, fields);
    if (refused.length > 1) {
      const names = [...new Set(refused.map((i) => i.path.map(String).join('.') || where))];
      throw new InvalidCharactersError(`These fields hold control or text-direction characters that cannot be stored: ${names.join(', ')}. Remove them and try again.`, fields);
    }
    const message = where === 'body' ? 'Some fields need attention.' : `The ${where} of the request is not valid.`;
    throw new ValidationError(fields, message);
  }
  return result.data;
}

/**
 * One Express router for the whole API. Every route declares who may call it, the zod schemas of
 * its input and output, and its handler; the declarations feed the OpenAPI document and the
 * authorization test.
 */
export class ApiRouter {
  readonly router = Router();
  readonly routes: RouteSpec[] = [];

  route<P extends z.ZodType = z.ZodType, Q extends z.ZodType = z.ZodType, B extends z.ZodType = z.ZodType>(spec: RouteSpec<P, Q, B>): void {
    this.routes.push(spec as unknown as RouteSpec);
    const run: RequestHandler = async (req, res) => {
      const result = await spec.handler({
        params: parse(spec.params, req.params, 'path') as z.output<P>,
        query: parse(spec.query, req.query, 'query') as z.output<Q>,
        body: parse(spec.body, req.body, 'body') as z.output<B>,
        req,
        res,
      });
      if (res.headersSent) return;
      const status = spec.status ?? 200;
      if (status === 204 || result === undefined) res.status(status === 200 ? 204 : status).end();
      else res.status(status).json(result);
    };
    const validateFirst: RequestHandler = (req, _res, next) => {
      parse(spec.params, req.params, 'path');
      parse(spec.query, req.query, 'query');
      parse(spec.body, req.body, 'body');
      next();
    };
    this.router[spec.method](spec.path, authorize(spec.access), ...(spec.before ? [validateFirst, ...spec.before] : []), run);
  }
}

export { errorEnvelope };
