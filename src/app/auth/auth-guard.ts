import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import { Role, Session } from './session';

/** Lets only a signed-in person through; everyone else goes to sign-in. */
export const signedInGuard: CanActivateFn = () => {
  const session = inject(Session);
  return session.signedIn() || inject(Router).createUrlTree(['/sign-in']);
};

/** Lets through only the roles listed in the route's `data.roles`; others go to their home. */
export const roleGuard: CanActivateFn = (route) => {
  const role = inject(Session).role();
  const allowed = (route.data['roles'] ?? []) as readonly Role[];
  if (role !== null && allowed.includes(role)) {
    return true;
  }
  return inject(Router).createUrlTree([role === null ? '/sign-in' : '/']);
};
