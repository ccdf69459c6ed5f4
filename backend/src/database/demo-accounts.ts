import type { Role } from '@tiermode/shared-types';

/** The demo password of the API contract. Demo mode only; never in a real install. */
export const DEMO_PASSWORD = 'tiermode-demo';

export interface DemoAccount {
  email: string;
  name: string;
  role: Role;
  licence?: { number: string; jurisdiction: string };
}

/** Invented people of an invented firm. */
export const DEMO_ACCOUNTS: readonly DemoAccount[] = [
  { email: 'admin@tiermode.test', name: 'Rowan Pike', role: 'admin' },
  { email: 'designer@tiermode.test', name: 'Mira Castell', role: 'designer' },
  {
    email: 'reviewer@tiermode.test',
    name: 'Tomas Hale',
    role: 'reviewer',
    licence: { number: 'SE-40117 (demo)', jurisdiction: 'Demo Licensing Board (invented)' },
  },
  { email: 'student@tiermode.test', name: 'Jun Okafor', role: 'student' },
];
