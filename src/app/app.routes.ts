import { inject } from '@angular/core';
import { Routes } from '@angular/router';
import { roleGuard, signedInGuard } from './auth/auth-guard';
import { Role, Session } from './auth/session';

/** Where each role starts; a wall display has no screen yet, so it goes back to sign-in. */
const HOME_BY_ROLE: Record<Role, string> = {
  owner: 'stations',
  lead: 'stations',
  operator: 'station-home',
  display: '/sign-in',
};

/** The app's screens. */
export const routes: Routes = [
  {
    path: 'sign-in',
    title: 'Sign in · Dwell',
    loadComponent: () => import('./auth/sign-in').then((m) => m.SignIn),
  },
  {
    path: 'station',
    title: 'Station sign-in · Dwell',
    loadComponent: () => import('./auth/pin-pad').then((m) => m.PinPad),
  },
  {
    path: '',
    canActivate: [signedInGuard],
    loadComponent: () => import('./shell/shell').then((m) => m.Shell),
    children: [
      {
        path: '',
        pathMatch: 'full',
        redirectTo: () => {
          const role = inject(Session).role();
          return role ? HOME_BY_ROLE[role] : '/sign-in';
        },
      },
      {
        path: 'stations',
        title: 'Stations · Dwell',
        canActivate: [roleGuard],
        data: { roles: ['owner', 'lead'] satisfies Role[] },
        loadComponent: () => import('./stations/stations-page').then((m) => m.StationsPage),
      },
      {
        path: 'orders',
        canActivate: [roleGuard],
        data: { roles: ['owner', 'lead'] satisfies Role[] },
        loadChildren: () => import('./orders/orders-routes').then((m) => m.ORDERS_ROUTES),
      },
      {
        path: 'station-home',
        title: 'Station · Dwell',
        canActivate: [roleGuard],
        data: { roles: ['operator'] satisfies Role[] },
        loadComponent: () => import('./stations/station-home').then((m) => m.StationHome),
      },
    ],
  },
  { path: '**', redirectTo: '' },
];
