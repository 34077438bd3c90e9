import { describe, expect, it } from 'vitest';
import { pageAccess, roleHome } from '../../../src/lib/auth/page-access';
import type { Actor } from '../../../src/lib/auth/actor';

const teacher: Actor = {
  kind: 'user',
  userId: 'u',
  role: 'teacher',
  schoolId: null,
  email: 't@x.org',
  displayName: 'T',
  sessionId: 's',
};
const url = new URL('http://127.0.0.1/classes?tab=2');

describe('pageAccess', () => {
  it('admits an actor of a listed audience', () => {
    expect(pageAccess(teacher, ['teacher'], url)).toEqual({ allowed: true });
  });

  it('sends anonymous visitors to sign-in with the page as next, or to /join for class pages', () => {
    expect(pageAccess({ kind: 'anonymous' }, ['teacher'], url)).toEqual({
      allowed: false,
      redirect: '/sign-in?next=%2Fclasses%3Ftab%3D2',
    });
    expect(pageAccess({ kind: 'anonymous' }, ['class'], url)).toEqual({ allowed: false, redirect: '/join' });
  });

  it('answers 403 to a signed-in visitor of another role', () => {
    expect(pageAccess(teacher, ['admin'], url)).toEqual({ allowed: false, status: 403 });
  });
});

describe('roleHome', () => {
  it('lands each role on the page of its daily work', () => {
    expect(roleHome('teacher')).toBe('/classes');
    expect(roleHome('coordinator')).toBe('/review');
    expect(roleHome('admin')).toBe('/admin/accounts');
  });
});
