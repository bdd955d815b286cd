import { navItemsFor } from './nav-items';

const labels = (...args: Parameters<typeof navItemsFor>) => navItemsFor(...args).map((item) => item.label);

describe('navItemsFor', () => {
  it('shows nothing to somebody signed out', () => {
    expect(navItemsFor(null, true)).toEqual([]);
  });

  it('shows a technician the catalogue, their tunnel time, the tests, the import profiles and the documents', () => {
    expect(labels('technician', true)).toEqual(['Catalogue', 'My tunnel time', 'Tests', 'Test articles', 'Import profiles', 'Documents']);
  });

  it('shows a customer the catalogue, the test planner, their bookings, their tests and their documents', () => {
    expect(labels('customer', true)).toEqual(['Catalogue', 'Test planner', 'My bookings', 'Tests', 'Documents']);
  });

  it('shows an analyst the catalogue, the test planner, the tests, the import profiles and the documents', () => {
    expect(labels('analyst', true)).toEqual(['Catalogue', 'Test planner', 'Tests', 'Test articles', 'Import profiles', 'Documents']);
  });

  it('shows a lab manager the administration sections, signing rights among them, and, in demo mode, the dev mailbox', () => {
    expect(labels('lab_manager', true)).toEqual(['Catalogue', 'Test planner', 'Bookings', 'Calendar', 'Tests', 'Test articles', 'Import profiles', 'Documents', 'Users', 'Signing rights', 'Tunnels', 'Services', 'Balances', 'Booking rules', 'Audit log', 'Dev mailbox']);
  });

  it('gives every role the documents, which lead to the issued result sheets', () => {
    for (const role of ['customer', 'technician', 'analyst', 'lab_manager'] as const) {
      expect(navItemsFor(role, false).find((item) => item.label === 'Documents')?.path).toBe('/documents');
    }
  });

  it('hides the dev mailbox when demo mode is off', () => {
    expect(labels('lab_manager', false)).not.toContain('Dev mailbox');
  });
});
