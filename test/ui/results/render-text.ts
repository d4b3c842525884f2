/**
 * A tiny renderer for tests only: walks a Preact element tree by calling function components and prints
 * HTML-like text, so the Results and Report components can be checked in Node without a DOM. Hooks must be
 * mocked by the test (only useState is used by these components). Text is escaped like HTML.
 */
import { Fragment } from 'preact';

function esc(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
}

interface Node {
  type: unknown;
  props: Record<string, unknown> & { children?: unknown };
}

function isNode(x: unknown): x is Node {
  return typeof x === 'object' && x !== null && 'type' in x && 'props' in x;
}

export function renderToText(node: unknown): string {
  if (node === null || node === undefined || typeof node === 'boolean') return '';
  if (typeof node === 'string') return esc(node);
  if (typeof node === 'number') return String(node);
  if (Array.isArray(node)) return node.map(renderToText).join('');
  if (!isNode(node)) throw new Error(`cannot render ${String(node)}`);
  const { type, props } = node;
  if (type === Fragment) return renderToText(props.children);
  if (typeof type === 'function') return renderToText((type as (p: unknown) => unknown)(props));
  if (typeof type !== 'string') throw new Error(`unknown element type ${String(type)}`);
  // As Preact does: aria-* and data-* keep true/false as text; other false attributes are left out.
  const spelled = (k: string): boolean => k[4] === '-';
  const attrs = Object.entries(props)
    .filter(([k, v]) => k !== 'children' && typeof v !== 'function' && v !== undefined && v !== null && (v !== false || spelled(k)))
    .map(([k, v]) => (v === true && !spelled(k) ? ` ${k}` : ` ${k}="${esc(String(v)).replace(/"/g, '&quot;')}"`))
    .join('');
  return `<${type}${attrs}>${renderToText(props.children)}</${type}>`;
}

/** Visible text of rendered markup: tags removed, entities decoded, spaces collapsed. */
export function textOf(html: string): string {
  return html
    .replace(/<title>.*?<\/title>/g, ' ')
    .replace(/<[^>]+>/g, ' ')
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&amp;/g, '&')
    .replace(/\s+/g, ' ')
    .trim();
}
