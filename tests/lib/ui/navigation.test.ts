import { describe, expect, it } from 'vitest';
import { navigationFor } from '../../../src/lib/ui/navigation';

const user = (role: 'teacher' | 'coordinator' | 'admin') =>
  ({
    kind: 'user',
    role,
    userId: 'u',
    schoolId: null,
    email: 'a@b.example',
    displayName: 'A',
    sessionId: 's',
  }) as const;

describe('navigationFor', () => {
  it('shows the review queue to staff and never to teachers or classes', () => {
    expect(navigationFor(user('coordinator')).map((i) => i.href)).toContain('/review');
    expect(navigationFor(user('admin')).map((i) => i.href)).toContain('/review');
    expect(navigationFor(user('teacher')).map((i) => i.href)).not.toContain('/review');
    expect(navigationFor({ kind: 'class', classId: 'c', classSessionId: 's' }).map((i) => i.href)).not.toContain(
      '/review',
    );
  });

  it('shows account administration to admins only', () => {
    for (const role of ['teacher', 'coordinator'] as const) {
      expect(navigationFor(user(role)).some((i) => i.href.startsWith('/admin'))).toBe(false);
    }
    expect(navigationFor(user('admin')).some((i) => i.href === '/admin/accounts')).toBe(true);
  });

  it('gives anonymous visitors only public pages', () => {
    expect(navigationFor({ kind: 'anonymous' }).map((i) => i.href)).toEqual(['/activities', '/journal']);
  });
});
