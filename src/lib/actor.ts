/**
 * Who is making a request: nobody, a signed-in account with a role, or a student class session (no
 * account, limited to one class). Framework-free and
 * below both src/lib/auth (which builds it) and src/lib/db (whose queries filter by it).
 */
export const ROLES = ['teacher', 'coordinator', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export type Actor =
  | { kind: 'anonymous' }
  | {
      kind: 'user';
      userId: string;
      role: Role;
      schoolId: string | null;
      email: string;
      displayName: string;
      sessionId: string;
    }
  | { kind: 'class'; classId: string; classSessionId: string };
