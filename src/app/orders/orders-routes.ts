import { Routes } from '@angular/router';

/** The lead's intake screens under /orders. */
export const ORDERS_ROUTES: Routes = [
  { path: '', title: 'Orders · Dwell', loadComponent: () => import('./orders-page').then((m) => m.OrdersPage) },
  { path: 'new', title: 'New order · Dwell', loadComponent: () => import('./order-form').then((m) => m.OrderForm) },
  { path: ':id', title: 'Order · Dwell', loadComponent: () => import('./order-detail').then((m) => m.OrderDetailPage) },
  { path: ':id/edit', title: 'Edit order · Dwell', loadComponent: () => import('./order-form').then((m) => m.OrderForm) },
  { path: ':id/jobs/new', title: 'New job · Dwell', loadComponent: () => import('./job-form').then((m) => m.JobForm) },
  { path: ':id/labels', title: 'Bag labels · Dwell', loadComponent: () => import('./label-sheet').then((m) => m.LabelSheet) },
];
