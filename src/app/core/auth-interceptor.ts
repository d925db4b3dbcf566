import { HttpErrorResponse, HttpInterceptorFn } from '@angular/common/http';
import { inject } from '@angular/core';
import { Router } from '@angular/router';
import { catchError, throwError } from 'rxjs';
import { Session } from '../auth/session';

/** On a 401 from a hub data call the session has ended: forget it and go to sign-in. */
export const authInterceptor: HttpInterceptorFn = (request, next) => {
  const session = inject(Session);
  const router = inject(Router);
  // The /api/auth/* calls answer 401 for a wrong password or PIN: their screens show the sentence.
  const watched = isApiCall(request.url) && !isAuthCall(request.url);
  return next(request).pipe(
    catchError((error: unknown) => {
      if (watched && error instanceof HttpErrorResponse && error.status === 401) {
        // A wall display has no one to type a password: its page signs in again with its own token.
        const wallDisplay = session.role() === 'display';
        session.clear();
        if (!wallDisplay) void router.navigateByUrl('/sign-in');
      }
      return throwError(() => error);
    }),
  );
};

function pathOf(url: string): string {
  return new URL(url, 'http://dwell.invalid').pathname;
}

function isApiCall(url: string): boolean {
  return pathOf(url).startsWith('/api/');
}

function isAuthCall(url: string): boolean {
  return pathOf(url).startsWith('/api/auth/');
}
