/**
 * Hash routes, so that every screen works from the precached index.html with no server help,
 * offline included. Shared case links use the fragment too (`#/open/<payload>`), so nothing is sent to a server.
 */

export type ScreenId = 'cases' | 'member' | 'results' | 'report' | 'section' | 'cautions' | 'measure';

export type Route = { screen: ScreenId } | { screen: 'open'; payload: string };

/** The four main screens in navigation order, with their labels. */
export const MAIN_SCREENS: readonly { id: ScreenId; label: string }[] = [
  { id: 'cases', label: 'Cases' },
  { id: 'member', label: 'Member' },
  { id: 'results', label: 'Results' },
  { id: 'report', label: 'Report' },
];

const SCREENS: readonly ScreenId[] = ['cases', 'member', 'results', 'report', 'section', 'cautions', 'measure'];

/** Reads a location hash ("#/results", "", "#/open/abc") into a route; anything unknown goes to Cases. */
export function parseHash(hash: string): Route {
  const path = hash.replace(/^#\/?/, '');
  if (path.startsWith('open/')) return { screen: 'open', payload: path.slice('open/'.length) };
  const id = path.split(/[/?]/)[0];
  return (SCREENS as readonly string[]).includes(id) ? { screen: id as ScreenId } : { screen: 'cases' };
}

export function hashFor(screen: ScreenId): string {
  return `#/${screen}`;
}
