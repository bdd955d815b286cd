import type { Role } from '@tunnelwright/contracts';

/** One entry of the side navigation. */
export interface NavItem {
  readonly label: string;
  readonly path: string;
  /** Material icon ligature. */
  readonly icon: string;
  /** Whether the entry appears only while the API runs in demo mode. */
  readonly demoOnly?: boolean;
}

const catalogue: NavItem = { label: 'Catalogue', path: '/catalogue', icon: 'view_list' };
const planner: NavItem = { label: 'Test planner', path: '/planner', icon: 'architecture' };
const tests: NavItem = { label: 'Tests', path: '/tests', icon: 'science' };
/** Staff keep the articles customers send; customers see theirs on their tests. */
const articles: NavItem = { label: 'Test articles', path: '/articles', icon: 'inventory_2' };
const importProfiles: NavItem = { label: 'Import profiles', path: '/import-profiles', icon: 'transform' };
const myBookings: NavItem = { label: 'My bookings', path: '/bookings', icon: 'event_available' };
const myWeek: NavItem = { label: 'My tunnel time', path: '/my-week', icon: 'today' };
const documents: NavItem = { label: 'Documents', path: '/documents', icon: 'description' };

/** Which sections each role may open, in the order they are listed. */
export const navItemsByRole: Readonly<Record<Role, readonly NavItem[]>> = {
  customer: [catalogue, planner, myBookings, tests, documents],
  technician: [catalogue, myWeek, tests, articles, importProfiles, documents],
  analyst: [catalogue, planner, tests, articles, importProfiles, documents],
  lab_manager: [
    catalogue,
    planner,
    { label: 'Bookings', path: '/lab-bookings', icon: 'event_note' },
    { label: 'Calendar', path: '/lab-calendar', icon: 'calendar_view_week' },
    tests,
    articles,
    importProfiles,
    documents,
    { label: 'Users', path: '/admin/users', icon: 'group' },
    { label: 'Signing rights', path: '/admin/signing-rights', icon: 'draw' },
    { label: 'Tunnels', path: '/admin/tunnels', icon: 'air' },
    { label: 'Services', path: '/admin/services', icon: 'sell' },
    { label: 'Balances', path: '/admin/balances', icon: 'balance' },
    { label: 'Booking rules', path: '/booking-rules', icon: 'rule' },
    { label: 'Audit log', path: '/admin/audit', icon: 'history' },
    { label: 'Dev mailbox', path: '/dev-mailbox', icon: 'mail', demoOnly: true },
  ],
};

/** The navigation for a role; demo-only entries appear only when demo mode is on. */
export function navItemsFor(role: Role | null, demoMode: boolean): readonly NavItem[] {
  if (role === null) {
    return [];
  }
  return navItemsByRole[role].filter((item) => demoMode || !item.demoOnly);
}
