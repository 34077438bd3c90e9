/**
 * What the teacher's class pages (/classes/:id and its poster) answer, decided once: teachers only, and only
 * the class's own teacher; anyone else's class answers 404 as if it did not exist, another role 403.
 */
import type { AstroGlobal } from 'astro';
import { classOwned } from '../../../lib/auth/class-access.server';
import { pageAccess } from '../../../lib/auth/page-access';
import { siteUrl } from '../../../lib/auth/site-url';
import type { ClassView } from '../../../lib/db/classes';
import { NotFoundError } from '../../../lib/errors';

/** A response to return at once (sign-in redirect, 404), or the class (null: 403, the page says so) and site. */
export async function classPageView(
  astro: AstroGlobal,
): Promise<{ response: Response } | { view: ClassView | null; site: string }> {
  const site = siteUrl(astro.url);
  const access = pageAccess(astro.locals.actor, ['teacher'], astro.url);
  if (!access.allowed && 'redirect' in access) return { response: astro.redirect(access.redirect) };
  if (!access.allowed) {
    astro.response.status = 403;
    return { view: null, site };
  }
  try {
    return { view: await classOwned(astro.locals.actor, astro.params.id ?? ''), site };
  } catch (err) {
    if (err instanceof NotFoundError) return { response: await astro.rewrite('/404') };
    throw err;
  }
}
