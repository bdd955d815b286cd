import { navItemsFor } from './nav-items';

const labels = (...args: Parameters<typeof navItemsFor>) => navItemsFor(...args).map((item) => item.label);

describe('navItemsFor', () => {
  it('shows nothing to somebody signed out', () => {
    expect(navItemsFor(null, true)).toEqual([]);
  });

  it('shows a technician only the catalogue', () => {
    expect(labels('technician', true)).toEqual(['Catalogue']);
  });

  it.each(['customer', 'analyst'] as const)('shows a %s the catalogue and the test planner', (role) => {
    expect(labels(role, true)).toEqual(['Catalogue', 'Test planner']);
  });

  it('shows a lab manager the administration sections and, in demo mode, the dev mailbox', () => {
    expect(labels('lab_manager', true)).toEqual(['Catalogue', 'Test planner', 'Users', 'Tunnels', 'Services', 'Audit log', 'Dev mailbox']);
  });

  it('hides the dev mailbox when demo mode is off', () => {
    expect(labels('lab_manager', false)).not.toContain('Dev mailbox');
  });
});
