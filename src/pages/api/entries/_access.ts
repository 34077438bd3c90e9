import type { Audience } from '../../../lib/auth/actor';

/** Who reaches the entries API at all; each entry's own rule is in src/lib/journal/entry-access.server.ts. */
export const ENTRY_CALLERS: readonly Audience[] = ['class', 'teacher', 'coordinator', 'admin'];
/** Who writes entries: teachers, and teams through their class session. */
export const ENTRY_AUTHORS: readonly Audience[] = ['class', 'teacher'];
