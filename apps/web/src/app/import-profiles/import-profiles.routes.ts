import { Routes } from '@angular/router';

/** The lab's import profiles: the list, a new profile, and a saved one to edit. */
export const importProfileRoutes: Routes = [
  {
    path: '',
    title: 'Import profiles · Tunnelwright',
    loadComponent: () => import('./import-profiles-page').then((m) => m.ImportProfilesPage),
  },
  {
    path: 'new',
    title: 'New import profile · Tunnelwright',
    loadComponent: () => import('./profile-editor-page').then((m) => m.ProfileEditorPage),
  },
  {
    path: ':id',
    title: 'Edit import profile · Tunnelwright',
    loadComponent: () => import('./profile-editor-page').then((m) => m.ProfileEditorPage),
  },
];
