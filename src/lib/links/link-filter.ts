/**
 * The filters of the live-links list: a search of the code, title and target, whose links (a saved kit's own or
 * made by hand), and whether retired. Read from the query string (the filter form submits by GET, so it works
 * without JavaScript and its address can be shared); unknown values mean "no filter", so a stale or hand-edited
 * address still shows the list rather than an error.
 */

export const LINK_OWNERS = ['any', 'kit', 'other'] as const;
export const LINK_OWNER_LABELS: Record<LinkOwner, string> = {
  any: 'All links',
  kit: 'Saved kits’ own links',
  other: 'Links made here',
};
export const LINK_STATES = ['any', 'live', 'retired'] as const;
export const LINK_STATE_LABELS: Record<LinkState, string> = {
  any: 'Live and retired',
  live: 'Live only',
  retired: 'Retired only',
};
/** Longest search kept; longer text is cut (a title is at most LINK_TITLE_MAX, a target LINK_TARGET_MAX). */
export const LINK_SEARCH_MAX = 100;

export type LinkOwner = (typeof LINK_OWNERS)[number];
export type LinkState = (typeof LINK_STATES)[number];

export interface LinkFilter {
  /** Text to find in the code, title or target, any case; "" finds every link. */
  search: string;
  owner: LinkOwner;
  state: LinkState;
}

export const LINK_FILTER_NONE: LinkFilter = { search: '', owner: 'any', state: 'any' };

const pick = <T extends string>(allowed: readonly T[], value: string | null, fallback: T): T =>
  value !== null && (allowed as readonly string[]).includes(value) ? (value as T) : fallback;

/** The filter a query string asks for (`q`, `owner`, `state`). */
export function linkFilterFromQuery(params: URLSearchParams): LinkFilter {
  return {
    search: (params.get('q') ?? '').trim().slice(0, LINK_SEARCH_MAX),
    owner: pick(LINK_OWNERS, params.get('owner'), 'any'),
    state: pick(LINK_STATES, params.get('state'), 'any'),
  };
}

/** A LIKE pattern that matches `text` anywhere, its own %, _ and \ taken literally (PostgreSQL's default escape). */
export function linkSearchPattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}
