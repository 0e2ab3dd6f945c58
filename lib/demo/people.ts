import type { Role } from '@/db/schema';

/** The demo lab's invented members, one per role. All share the demo password. */
export const DEMO_PASSWORD = 'margin-demo';
export const DEMO_LAB = 'Riverside Water Quality';

export const DEMO_PEOPLE: { name: string; email: string; role: Role }[] = [
  { name: 'Ines Okafor', email: 'ines@riverside.example', role: 'owner' },
  { name: 'Tomas Lindqvist', email: 'tomas@riverside.example', role: 'author' },
  { name: 'Priya Castellano', email: 'priya@riverside.example', role: 'reviewer' },
  { name: 'Jonah Whitcombe', email: 'jonah@riverside.example', role: 'reader' },
];
