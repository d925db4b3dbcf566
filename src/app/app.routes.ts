import { inject } from '@angular/core';
import { Routes } from '@angular/router';
import { roleGuard, signedInGuard } from './auth/auth-guard';
import { Role, Session } from './auth/session';

/** Where each role starts; a wall display shows the floor board outside the shell. */
const HOME_BY_ROLE: Record<Role, string> = {
  owner: 'board',
  lead: 'board',
  operator: 'station-home',
  display: '/display',
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
    // A wall screen: no navigation; it signs itself in with the token from its display link.
    path: 'display',
    title: 'Floor board · Dwell',
    loadComponent: () => import('./board/wall-display').then((m) => m.WallDisplay),
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
        path: 'board',
        title: 'Floor board · Dwell',
        canActivate: [roleGuard],
        data: { roles: ['owner', 'lead'] satisfies Role[] },
        loadComponent: () => import('./board/floor-board').then((m) => m.FloorBoard),
      },
      {
        path: 'people',
        title: 'People · Dwell',
        canActivate: [roleGuard],
        data: { roles: ['owner', 'lead'] satisfies Role[] },
        loadComponent: () => import('./people/people-page').then((m) => m.PeoplePage),
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
      {
        path: 'gang-planner',
        title: 'Gang planner · Dwell',
        canActivate: [roleGuard],
        data: { roles: ['owner', 'lead', 'operator'] satisfies Role[] },
        loadComponent: () => import('./cutting/gang-planner').then((m) => m.GangPlanner),
      },
      {
        path: 'cut-station',
        title: 'Cut station · Dwell',
        canActivate: [roleGuard],
        data: { roles: ['owner', 'lead', 'operator'] satisfies Role[] },
        loadComponent: () => import('./cutting/cut-station').then((m) => m.CutStation),
      },
      {
        path: 'roll-rack',
        title: 'Roll rack · Dwell',
        canActivate: [roleGuard],
        data: { roles: ['owner', 'lead', 'operator'] satisfies Role[] },
        loadComponent: () => import('./rolls/roll-rack').then((m) => m.RollRack),
      },
      {
        path: 'weed',
        title: 'Weed tally · Dwell',
        canActivate: [roleGuard],
        data: { roles: ['operator'] satisfies Role[] },
        loadComponent: () => import('./weed/weed-tally').then((m) => m.WeedTally),
      },
      {
        path: 'pack',
        title: 'Pack check · Dwell',
        canActivate: [roleGuard],
        data: { roles: ['operator'] satisfies Role[] },
        loadComponent: () => import('./pack/pack-check').then((m) => m.PackCheck),
      },
      {
        path: 'mail',
        title: 'Mail outbox · Dwell',
        canActivate: [roleGuard],
        data: { roles: ['owner', 'lead'] satisfies Role[] },
        loadComponent: () => import('./mail/mail-outbox').then((m) => m.MailOutbox),
      },
      {
        path: 'reports',
        title: 'Reports · Dwell',
        canActivate: [roleGuard],
        data: { roles: ['owner', 'lead'] satisfies Role[] },
        loadComponent: () => import('./reports/floor-report').then((m) => m.FloorReport),
      },
      {
        path: 'spoil',
        title: 'Spoil report · Dwell',
        canActivate: [roleGuard],
        data: { roles: ['operator'] satisfies Role[] },
        loadComponent: () => import('./spoil/spoil-report').then((m) => m.SpoilReport),
      },
      {
        path: 'bag/:token',
        title: 'Bag · Dwell',
        canActivate: [roleGuard],
        data: { roles: ['operator', 'lead', 'owner'] satisfies Role[] },
        loadComponent: () => import('./scan/bag-link').then((m) => m.BagLink),
      },
      {
        path: 'press',
        title: 'Press card · Dwell',
        canActivate: [roleGuard],
        data: { roles: ['operator'] satisfies Role[] },
        loadComponent: () => import('./press/press-card-page').then((m) => m.PressCardPage),
      },
      {
        path: 'recipes',
        title: 'Recipe book · Dwell',
        canActivate: [roleGuard],
        data: { roles: ['owner', 'lead'] satisfies Role[] },
        loadComponent: () => import('./recipes/recipe-book').then((m) => m.RecipeBook),
      },
      {
        // A lead reads the settings here by the page's address; only the owner changes them.
        path: 'shop-settings',
        title: 'Shop settings · Dwell',
        canActivate: [roleGuard],
        data: { roles: ['owner', 'lead'] satisfies Role[] },
        loadComponent: () => import('./shop/shop-settings-page').then((m) => m.ShopSettingsPage),
      },
    ],
  },
  { path: '**', redirectTo: '' },
];
