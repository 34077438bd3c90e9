import { describe, expect, it } from 'vitest';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { navigationFor } from '../../../src/lib/ui/navigation';
import type { Actor } from '../../../src/lib/auth/actor';

const user = (role: 'teacher' | 'coordinator' | 'admin'): Actor => ({
  kind: 'user',
  role,
  userId: 'u',
  schoolId: null,
  email: 'a@b.example',
  displayName: 'A',
  sessionId: 's',
});
const ACTORS: Actor[] = [
  { kind: 'anonymous' },
  { kind: 'class', classId: 'c', classSessionId: 's' },
  user('teacher'),
  user('coordinator'),
  user('admin'),
];

/** True when src/pages has a page for the path (as a file or as a folder index). */
function pageExists(href: string): boolean {
  const base = fileURLToPath(new URL(`../../../src/pages${href}`, import.meta.url));
  return existsSync(`${base}.astro`) || existsSync(`${base}/index.astro`);
}

describe('navigationFor', () => {
  it('links only to pages that exist', () => {
    for (const actor of ACTORS) {
      for (const item of navigationFor(actor, { outbox: true })) {
        expect(pageExists(item.href), `${item.href} for ${actor.kind}`).toBe(true);
      }
    }
  });

  it('shows account administration to admins only', () => {
    for (const actor of ACTORS.filter((a) => !(a.kind === 'user' && a.role === 'admin'))) {
      expect(navigationFor(actor, { outbox: true }).some((i) => i.href.startsWith('/admin'))).toBe(false);
    }
    expect(navigationFor(user('admin')).some((i) => i.href === '/admin/accounts')).toBe(true);
  });

  it('shows the outbox only where the development mail fake runs', () => {
    expect(navigationFor(user('admin'), { outbox: false }).some((i) => i.href === '/admin/outbox')).toBe(false);
    expect(navigationFor(user('admin'), { outbox: true }).some((i) => i.href === '/admin/outbox')).toBe(true);
  });

  it('takes every account to its imported models, and no class session or visitor', () => {
    for (const role of ['teacher', 'coordinator', 'admin'] as const) {
      expect(navigationFor(user(role)).map((i) => i.href)).toContain('/models/imports');
    }
    expect(navigationFor({ kind: 'class', classId: 'c', classSessionId: 's' }).map((i) => i.href)).not.toContain(
      '/models/imports',
    );
    expect(navigationFor({ kind: 'anonymous' }).map((i) => i.href)).not.toContain('/models/imports');
  });

  it('gives anonymous visitors only public pages', () => {
    expect(navigationFor({ kind: 'anonymous' }).map((i) => i.href)).toEqual(['/activities', '/tools', '/events']);
  });

  it('takes coordinators and admins to managing events and live links, and no one else', () => {
    for (const role of ['coordinator', 'admin'] as const) {
      const hrefs = navigationFor(user(role)).map((i) => i.href);
      expect(hrefs).toContain('/events/manage');
      expect(hrefs).toContain('/links');
    }
    for (const actor of ACTORS.filter((a) => !(a.kind === 'user' && a.role !== 'teacher'))) {
      const hrefs = navigationFor(actor, { outbox: true }).map((i) => i.href);
      expect(hrefs).not.toContain('/events/manage');
      expect(hrefs).not.toContain('/links');
    }
  });
});
