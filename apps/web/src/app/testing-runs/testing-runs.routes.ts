import { Routes } from '@angular/router';
import { roleGuard } from '../core/role-guard';

/** Tests, their runs, uploads and reductions; customers see their own tests read-only. */
export const testingRunsRoutes: Routes = [
  {
    path: 'tests',
    title: 'Tests · Tunnelwright',
    loadComponent: () => import('./tests-page').then((m) => m.TestsPage),
  },
  {
    path: 'tests/new',
    title: 'Open a test · Tunnelwright',
    canActivate: [roleGuard(['technician', 'analyst', 'lab_manager'])],
    loadComponent: () => import('./test-form-page').then((m) => m.TestFormPage),
  },
  {
    path: 'tests/:id/edit',
    title: 'Edit test · Tunnelwright',
    canActivate: [roleGuard(['technician', 'analyst', 'lab_manager'])],
    loadComponent: () => import('./test-form-page').then((m) => m.TestFormPage),
  },
  {
    path: 'articles',
    title: 'Test articles · Tunnelwright',
    canActivate: [roleGuard(['technician', 'analyst', 'lab_manager'])],
    loadComponent: () => import('./articles-page').then((m) => m.ArticlesPage),
  },
  {
    path: 'tests/:id',
    title: 'Test · Tunnelwright',
    loadComponent: () => import('./test-page').then((m) => m.TestPage),
  },
  {
    path: 'tests/:id/upload',
    title: 'Upload run files · Tunnelwright',
    canActivate: [roleGuard(['technician', 'lab_manager'])],
    loadComponent: () => import('./upload-page').then((m) => m.UploadPage),
  },
  {
    path: 'tests/:id/review',
    title: 'Review · Tunnelwright',
    canActivate: [roleGuard(['technician', 'analyst', 'lab_manager'])],
    loadComponent: () => import('../review/review-page').then((m) => m.ReviewPage),
  },
  {
    path: 'runs/:id',
    title: 'Run · Tunnelwright',
    canActivate: [roleGuard(['technician', 'analyst', 'lab_manager'])],
    loadComponent: () => import('./run-page').then((m) => m.RunPage),
  },
];
