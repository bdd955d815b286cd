import type { Role } from '@tunnelwright/contracts';

/** The invented demo laboratory and its customers. None of these are real places, firms or people. */
export const demoLab = {
  name: 'Brackenmoor Aerodynamics Laboratory',
  timeZone: 'Europe/London',
  currency: 'GBP',
};

export const demoCustomers = {
  quillfen: 'Quillfen Bridgeworks',
  tarnwick: 'Tarnwick Solar Frames',
} as const;

/** One password for every demo account; it passes the server's strength check. */
export const demoPassword = 'Gusty-Lantern-Orchard-73';

export interface DemoUser {
  email: string;
  name: string;
  role: Role;
  /** Organisation name: the lab or one of the customers. */
  organisation: string;
}

/** Demo sign-ins, one per role plus a customer of the second organisation. */
export const demoUsers: DemoUser[] = [
  { email: 'manager@brackenmoor.example', name: 'Imogen Threlfall', role: 'lab_manager', organisation: demoLab.name },
  { email: 'analyst@brackenmoor.example', name: 'Daniel Okonjo-Vale', role: 'analyst', organisation: demoLab.name },
  { email: 'technician@brackenmoor.example', name: 'Rhys Penhallow', role: 'technician', organisation: demoLab.name },
  { email: 'customer@quillfen.example', name: 'Harriet Moss', role: 'customer', organisation: demoCustomers.quillfen },
  { email: 'customer@tarnwick.example', name: 'Tobias Enderby', role: 'customer', organisation: demoCustomers.tarnwick },
];
