import { Routes } from '@angular/router';
import { bookingRoutes } from './booking/booking.routes';
import { roleGuard } from './core/role-guard';
import { signedInGuard, signedOutGuard } from './core/signed-in-guard';

export const routes: Routes = [
  {
    path: 'sign-in',
    title: 'Sign in · Tunnelwright',
    canActivate: [signedOutGuard],
    loadComponent: () => import('./auth/sign-in-page').then((m) => m.SignInPage),
  },
  {
    path: 'forgot-password',
    title: 'Forgotten password · Tunnelwright',
    canActivate: [signedOutGuard],
    loadComponent: () => import('./auth/forgot-password-page').then((m) => m.ForgotPasswordPage),
  },
  {
    path: 'reset-password',
    title: 'Choose a new password · Tunnelwright',
    loadComponent: () => import('./auth/reset-password-page').then((m) => m.ResetPasswordPage),
  },
  {
    // No signed-out guard: a lab manager may follow an invitation link to try it out in the same browser.
    path: 'accept-invitation',
    title: 'Accept invitation · Tunnelwright',
    loadComponent: () => import('./auth/accept-invitation-page').then((m) => m.AcceptInvitationPage),
  },
  {
    // Public: whoever holds a sheet checks it here, signed in or not (the QR code on each page links here).
    path: 'verify',
    title: 'Check a result sheet · Tunnelwright',
    loadComponent: () => import('./verify/verify-page').then((m) => m.VerifyPage),
  },
  {
    path: 'verify/:reportNumber',
    title: 'Check a result sheet · Tunnelwright',
    loadComponent: () => import('./verify/verify-page').then((m) => m.VerifyPage),
  },
  {
    path: '',
    canActivate: [signedInGuard],
    loadComponent: () => import('./core/app-shell').then((m) => m.AppShell),
    children: [
      { path: '', pathMatch: 'full', redirectTo: 'catalogue' },
      {
        path: 'catalogue',
        title: 'Catalogue · Tunnelwright',
        loadComponent: () => import('./catalogue/catalogue-page').then((m) => m.CataloguePage),
      },
      {
        path: 'planner',
        title: 'Test planner · Tunnelwright',
        canActivate: [roleGuard(['customer', 'analyst', 'lab_manager'])],
        loadComponent: () => import('./planner/planner-page').then((m) => m.PlannerPage),
      },
      ...bookingRoutes,
      {
        path: '',
        loadChildren: () => import('./testing-runs/testing-runs.routes').then((m) => m.testingRunsRoutes),
      },
      {
        path: 'import-profiles',
        canActivate: [roleGuard(['technician', 'analyst', 'lab_manager'])],
        loadChildren: () => import('./import-profiles/import-profiles.routes').then((m) => m.importProfileRoutes),
      },
      {
        path: 'documents',
        title: 'Documents · Tunnelwright',
        loadComponent: () => import('./documents/documents-page').then((m) => m.DocumentsPage),
      },
      {
        path: 'documents/:id',
        title: 'Result sheet · Tunnelwright',
        loadComponent: () => import('./documents/document-page').then((m) => m.DocumentPage),
      },
      {
        path: 'profile',
        title: 'Your profile · Tunnelwright',
        loadComponent: () => import('./profile/profile-page').then((m) => m.ProfilePage),
      },
      {
        path: 'admin',
        canActivate: [roleGuard(['lab_manager'])],
        loadChildren: () => import('./admin/admin.routes').then((m) => m.adminRoutes),
      },
      {
        path: 'dev-mailbox',
        title: 'Dev mailbox · Tunnelwright',
        canActivate: [roleGuard(['lab_manager'])],
        loadComponent: () => import('./dev-mailbox/dev-mailbox-page').then((m) => m.DevMailboxPage),
      },
      {
        path: 'not-allowed',
        title: 'Not allowed · Tunnelwright',
        loadComponent: () => import('./core/not-allowed-page').then((m) => m.NotAllowedPage),
      },
    ],
  },
  {
    path: '**',
    title: 'Page not found · Tunnelwright',
    loadComponent: () => import('./core/not-found-page').then((m) => m.NotFoundPage),
  },
];
