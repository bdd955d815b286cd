import { Routes } from '@angular/router';
import { roleGuard } from '../core/role-guard';

/** Customers' bookings, lab managers' answers, calendar and booking rules, technicians' week. */
export const bookingRoutes: Routes = [
  {
    path: 'bookings',
    title: 'My bookings · Tunnelwright',
    canActivate: [roleGuard(['customer'])],
    loadComponent: () => import('./my-bookings-page').then((m) => m.MyBookingsPage),
  },
  {
    path: 'bookings/new',
    title: 'Request tunnel time · Tunnelwright',
    canActivate: [roleGuard(['customer'])],
    loadComponent: () => import('./booking-request-page').then((m) => m.BookingRequestPage),
  },
  {
    path: 'lab-bookings',
    title: 'Bookings · Tunnelwright',
    canActivate: [roleGuard(['lab_manager'])],
    loadComponent: () => import('./lab-bookings-page').then((m) => m.LabBookingsPage),
  },
  {
    path: 'lab-calendar',
    title: 'Calendar · Tunnelwright',
    canActivate: [roleGuard(['lab_manager'])],
    loadComponent: () => import('./lab-calendar-page').then((m) => m.LabCalendarPage),
  },
  {
    path: 'booking-rules',
    title: 'Booking rules · Tunnelwright',
    canActivate: [roleGuard(['lab_manager'])],
    loadComponent: () => import('./booking-rules-page').then((m) => m.BookingRulesPage),
  },
  {
    path: 'my-week',
    title: 'My tunnel time · Tunnelwright',
    canActivate: [roleGuard(['technician'])],
    loadComponent: () => import('./technician-bookings-page').then((m) => m.TechnicianBookingsPage),
  },
];
