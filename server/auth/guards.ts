import type { RequestHandler } from 'express';
import { ROLES, type Role } from '../../src/shared/names';
import { forbidden, unauthorized } from '../http/http-error';

/** A route guard that says, for the role matrix test, who may pass it. */
export type RoleGuard = RequestHandler & { readonly allowedRoles: readonly Role[] };

/** A marker for the few routes anyone may call (signing in, health); the reason is for readers. */
export type PublicMarker = RequestHandler & { readonly publicBecause: string };

/** Lets through only signed-in principals of the given roles: 401 for nobody, 403 for the wrong role. */
export function allowRoles(...roles: Role[]): RoleGuard {
  const guard: RequestHandler = (req, _res, next) => {
    if (!req.principal) throw unauthorized();
    if (!roles.includes(req.principal.role)) throw forbidden();
    next();
  };
  return Object.assign(guard, { allowedRoles: roles });
}

/** Any signed-in principal, display included. */
export const signedIn = () => allowRoles(...ROLES);

/** Marks a route as open to anyone, saying why. */
export function publicRoute(reason: string): PublicMarker {
  const marker: RequestHandler = (_req, _res, next) => next();
  return Object.assign(marker, { publicBecause: reason });
}
