/**
 * The invented demo accounts (used only by the demo). Passwords are printed by `npm start`; they are 15+
 * characters as the sign-in rules require.
 */
export const DEMO_ACCOUNTS = [
  {
    email: 'admin@northfield-lab.example',
    displayName: 'Ada Okafor-Lind',
    role: 'admin',
    password: 'demo-admin-pass-2026',
  },
  {
    email: 'coordinator@northfield-lab.example',
    displayName: 'Rui Calloway',
    role: 'coordinator',
    password: 'demo-coordinator-pass-2026',
  },
  {
    email: 'teacher@juniper-flats.example',
    displayName: 'Mina Thorsby',
    role: 'teacher',
    password: 'demo-teacher-pass-2026',
    school: 'Juniper Flats Middle School',
  },
  {
    email: 'teacher@larkspur.example',
    displayName: 'Owen Pellquist',
    role: 'teacher',
    password: 'demo-teacher-pass-2026',
    school: 'Larkspur Elementary',
  },
  {
    email: 'teacher@bright-creek.example',
    displayName: 'Sade Marrow',
    role: 'teacher',
    password: 'demo-teacher-pass-2026',
    school: 'Bright Creek High School',
  },
] as const;
