import type { RequestHandler } from 'express';
import { can, type Action, type Resource } from '../../shared/permissions.js';
import { ForbiddenError, UnauthenticatedError } from './errors.js';

/** Who may call a route: anyone, any signed-in user, or the roles a permission names. */
export type Access =
  | { kind: 'public' }
  | { kind: 'signed-in' }
  | { kind: 'permission'; resource: Resource; action: string };

export const anyone: Access = { kind: 'public' };
export const signedIn: Access = { kind: 'signed-in' };
export function allowed<R extends Resource>(resource: R, action: Action<R>): Access {
  return { kind: 'permission', resource, action };
}

export function authorize(access: Access): RequestHandler {
  return (req, _res, next) => {
    if (access.kind === 'public') return next();
    if (!req.user) return next(new UnauthenticatedError());
    if (access.kind === 'permission' && !can(req.user.role, access.resource, access.action as never)) {
      return next(new ForbiddenError());
    }
    next();
  };
}
