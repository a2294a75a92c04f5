import type { Role } from '../shared/auth/roles.ts';

/**
 * The demo workshop: an invented evening casting class at a community
 * makerspace. Every demo account shares one password, listed in README.md.
 */
export const DEMO_PASSWORD = 'pour-safely-2026';
export const DEMO_WORKSHOP = { name: 'Harbour Lane Makerspace — Thursday casting class', kind: 'makerspace' as const };

export const DEMO_PEOPLE: { email: string; displayName: string; role: Role; mentors?: string[] }[] = [
  { email: 'morgan@harbourlane.test', displayName: 'Morgan Reyes', role: 'admin' },
  { email: 'priya@harbourlane.test', displayName: 'Priya Natarajan', role: 'mentor' },
  { email: 'tomasz@harbourlane.test', displayName: 'Tomasz Wójcik', role: 'mentor' },
  { email: 'jonah@harbourlane.test', displayName: 'Jonah Pike', role: 'student', mentors: ['priya@harbourlane.test'] },
  { email: 'lena@harbourlane.test', displayName: 'Lena Okafor', role: 'student', mentors: ['priya@harbourlane.test'] },
  { email: 'sam@harbourlane.test', displayName: 'Sam Whitlock', role: 'student', mentors: ['tomasz@harbourlane.test'] },
  {
    email: 'aiko@harbourlane.test',
    displayName: 'Aiko Mori',
    role: 'student',
    mentors: ['tomasz@harbourlane.test', 'priya@harbourlane.test'],
  },
  { email: 'ray@harbourlane.test', displayName: 'Ray Dunmore', role: 'caster' },
];
