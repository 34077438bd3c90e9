/**
 * The main navigation for each kind of visitor: one list per audience, so a role sees only what it may
 * open. Pure data, used by the layout and checked by tests/lib/ui/navigation.test.ts (every link must have a
 * page). The review queue, schools, reach and live-link pages join the staff lists when they are built.
 */
import type { Actor } from '../auth/actor';

export interface NavItem {
  href: string;
  label: string;
}

export interface NavigationOptions {
  /** The development outbox of the local SMTP fake exists (MAIL_OUTBOX_URL is set). */
  outbox: boolean;
}

const ACTIVITIES: NavItem = { href: '/activities', label: 'Activities' };
const TOOLS: NavItem = { href: '/tools', label: 'Data tools' };

const PUBLIC: NavItem[] = [ACTIVITIES, TOOLS];

const BY_ROLE: Record<'teacher' | 'coordinator' | 'admin', NavItem[]> = {
  teacher: [
    { href: '/classes', label: 'My classes' },
    { href: '/kits/new', label: 'Kit builder' },
    { href: '/kits', label: 'My kits' },
    ACTIVITIES,
    TOOLS,
  ],
  coordinator: [
    { href: '/reach', label: 'Reach' },
    { href: '/kits', label: 'Kits' },
    { href: '/classes', label: 'Classes' },
    ACTIVITIES,
    TOOLS,
  ],
  admin: [
    { href: '/admin/accounts', label: 'Accounts' },
    { href: '/reach', label: 'Reach' },
    { href: '/kits', label: 'Kits' },
    { href: '/classes', label: 'Classes' },
    ACTIVITIES,
  ],
};

const CLASS_SESSION: NavItem[] = [{ href: '/class', label: 'Our class' }, TOOLS];

/** The navigation items for an actor. */
export function navigationFor(actor: Actor, options: NavigationOptions = { outbox: false }): NavItem[] {
  if (actor.kind === 'class') return CLASS_SESSION;
  if (actor.kind !== 'user') return PUBLIC;
  const items = BY_ROLE[actor.role];
  return actor.role === 'admin' && options.outbox ? [...items, { href: '/admin/outbox', label: 'Outbox' }] : items;
}
