import type { Audience } from '../../../lib/auth/actor';

/** Who may open saved kits: a class session (its class's kits), teachers (their classes' kits) and staff. */
export const KIT_VIEWERS: readonly Audience[] = ['class', 'teacher', 'coordinator', 'admin'];
