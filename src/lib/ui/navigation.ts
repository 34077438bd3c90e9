/**
 * The main navigation for each kind of visitor: one list per audience, so a role sees only what it may
 * open. Pure data, used by the layout and checked by tests/lib/ui/navigation.test.ts.
 */
import type { Actor } from '../auth/actor';

export interface NavItem {
  href: string;
  label: string;
}

const PUBLIC: NavItem[] = [
  { href: '/activities', label: 'Activities' },
  { href: '/journal', label: 'Class journals' },
];

const BY_ROLE: Record<'teacher' | 'coordinator' | 'admin', NavItem[]> = {
  teacher: [
    { href: '/classes', label: 'My classes' },
    { href: '/kits/new', label: 'Kit builder' },
    { href: '/activities', label: 'Activities' },
    { href: '/tools', label: 'Data tools' },
  ],
  coordinator: [
    { href: '/review', label: 'Review queue' },
    { href: '/schools', label: 'Schools' },
    { href: '/reach', label: 'Reach' },
    { href: '/links', label: 'Live links' },
    { href: '/activities', label: 'Activities' },
  ],
  admin: [
    { href: '/review', label: 'Review queue' },
    { href: '/schools', label: 'Schools' },
    { href: '/admin/accounts', label: 'Accounts' },
    { href: '/admin/outbox', label: 'Outbox' },
    { href: '/activities', label: 'Activities' },
  ],
};

const CLASS_SESSION: NavItem[] = [
  { href: '/class', label: 'Our class' },
  { href: '/tools', label: 'Data tools' },
];

/** The navigation items for an actor. */
export function navigationFor(actor: Actor): NavItem[] {
  if (actor.kind === 'user') return BY_ROLE[actor.role];
  if (actor.kind === 'class') return CLASS_SESSION;
  return PUBLIC;
}
