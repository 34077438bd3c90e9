/**
 * The main navigation for each kind of visitor: one list per audience, so a role sees only what it may
 * open. Pure data, used by the layout and checked by tests/lib/ui/navigation.test.ts (every link must have a
 * page). Staff reach events and live links from here; everyone sees the public list of events.
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
const EVENTS: NavItem = { href: '/events', label: 'Events' };
const MANAGE_EVENTS: NavItem = { href: '/events/manage', label: 'Events' };
const LIVE_LINKS: NavItem = { href: '/links', label: 'Live links' };

/** Imported meshes: a teacher's own (and the shared ones), for staff every one. */
const MODELS_OWN: NavItem = { href: '/models/imports', label: 'My models' };
const MODELS_ALL: NavItem = { href: '/models/imports', label: 'Models' };

const JOURNAL: NavItem = { href: '/entries', label: 'Class journal' };
const REVIEW: NavItem = { href: '/review', label: 'Review queue' };

const PUBLIC: NavItem[] = [ACTIVITIES, TOOLS, EVENTS];

const BY_ROLE: Record<'teacher' | 'coordinator' | 'admin', NavItem[]> = {
  teacher: [
    { href: '/classes', label: 'My classes' },
    { href: '/kits/new', label: 'Kit builder' },
    { href: '/kits', label: 'My kits' },
    MODELS_OWN,
    JOURNAL,
    ACTIVITIES,
    TOOLS,
    EVENTS,
  ],
  coordinator: [
    REVIEW,
    { href: '/reach', label: 'Reach' },
    MANAGE_EVENTS,
    LIVE_LINKS,
    { href: '/kits', label: 'Kits' },
    MODELS_ALL,
    { href: '/classes', label: 'Classes' },
    ACTIVITIES,
    TOOLS,
  ],
  admin: [
    { href: '/admin/accounts', label: 'Accounts' },
    REVIEW,
    { href: '/reach', label: 'Reach' },
    MANAGE_EVENTS,
    LIVE_LINKS,
    { href: '/kits', label: 'Kits' },
    MODELS_ALL,
    { href: '/classes', label: 'Classes' },
    ACTIVITIES,
  ],
};

const CLASS_SESSION: NavItem[] = [{ href: '/class', label: 'Our class' }, JOURNAL, TOOLS];

/** The navigation items for an actor. */
export function navigationFor(actor: Actor, options: NavigationOptions = { outbox: false }): NavItem[] {
  if (actor.kind === 'class') return CLASS_SESSION;
  if (actor.kind !== 'user') return PUBLIC;
  const items = BY_ROLE[actor.role];
  return actor.role === 'admin' && options.outbox ? [...items, { href: '/admin/outbox', label: 'Outbox' }] : items;
}
