import { Routes } from '@angular/router';

/** Lab-manager sections; the parent route's role guard admits only lab managers. */
export const adminRoutes: Routes = [
  { path: '', pathMatch: 'full', redirectTo: 'users' },
  {
    path: 'users',
    title: 'Users · Tunnelwright',
    loadComponent: () => import('./users/users-page').then((m) => m.UsersPage),
  },
  {
    path: 'tunnels',
    title: 'Tunnels · Tunnelwright',
    loadComponent: () => import('./tunnels/tunnels-page').then((m) => m.TunnelsPage),
  },
  {
    path: 'services',
    title: 'Services · Tunnelwright',
    loadComponent: () => import('./services/services-page').then((m) => m.ServicesPage),
  },
  {
    path: 'balances',
    title: 'Balances · Tunnelwright',
    loadComponent: () => import('./balances/balances-page').then((m) => m.BalancesPage),
  },
  {
    path: 'signing-rights',
    title: 'Signing rights · Tunnelwright',
    loadComponent: () => import('./signing-rights/signing-rights-page').then((m) => m.SigningRightsPage),
  },
  {
    path: 'audit',
    title: 'Audit log · Tunnelwright',
    loadComponent: () => import('./audit/audit-page').then((m) => m.AuditPage),
  },
];
