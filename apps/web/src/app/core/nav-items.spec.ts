import { navItemsFor } from './nav-items';

const labels = (...args: Parameters<typeof navItemsFor>) => navItemsFor(...args).map((item) => item.label);

describe('navItemsFor', () => {
  it('shows nothing to somebody signed out', () => {
    expect(navItemsFor(null, true)).toEqual([]);
  });

  it('shows a technician the catalogue, their tunnel time and the tests', () => {
    expect(labels('technician', true)).toEqual(['Catalogue', 'My tunnel time', 'Tests']);
  });

  it('shows a customer the catalogue, the test planner, their bookings and their tests', () => {
    expect(labels('customer', true)).toEqual(['Catalogue', 'Test planner', 'My bookings', 'Tests']);
  });

  it('shows an analyst the catalogue, the test planner and the tests', () => {
    expect(labels('analyst', true)).toEqual(['Catalogue', 'Test planner', 'Tests']);
  });

  it('shows a lab manager the administration sections, signing rights among them, and, in demo mode, the dev mailbox', () => {
    expect(labels('lab_manager', true)).toEqual(['Catalogue', 'Test planner', 'Bookings', 'Calendar', 'Tests', 'Users', 'Signing rights', 'Tunnels', 'Services', 'Booking rules', 'Audit log', 'Dev mailbox']);
  });

  it('hides the dev mailbox when demo mode is off', () => {
    expect(labels('lab_manager', false)).not.toContain('Dev mailbox');
  });
});
