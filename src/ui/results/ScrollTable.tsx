import type { ComponentChildren, RefObject } from 'preact';
import { useEffect, useRef, useState } from 'preact/hooks';

/** Whether a box has columns hidden beyond its right or left edge, updated on resize and scroll. */
function useSideOverflow(): [RefObject<HTMLDivElement | null>, { right: boolean; left: boolean }] {
  const ref = useRef<HTMLDivElement>(null);
  const [state, setState] = useState({ right: false, left: false });
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const update = (): void => {
      const right = el.scrollLeft + el.clientWidth < el.scrollWidth - 2;
      const left = el.scrollLeft > 2;
      setState((s) => (s.right === right && s.left === left ? s : { right, left }));
    };
    update();
    el.addEventListener('scroll', update, { passive: true });
    const ro = typeof ResizeObserver === 'undefined' ? null : new ResizeObserver(update);
    ro?.observe(el);
    return () => {
      el.removeEventListener('scroll', update);
      ro?.disconnect();
    };
  }, []);
  return [ref, state];
}

/**
 * A table that scrolls sideways inside its own box on narrow screens (never the whole page). The box is
 * focusable and named by the caption, so keyboard users can scroll it too. When columns are hidden, a line
 * above the table says so and the hidden edge is shaded, so no column is lost without a hint.
 */
export function ScrollTable({ caption, class: cls, children }: { caption: string; class?: string; children: ComponentChildren }) {
  const [ref, hidden] = useSideOverflow();
  const edge = `${hidden.right ? ' more-right' : ''}${hidden.left ? ' more-left' : ''}`;
  return (
    <>
      {(hidden.right || hidden.left) && (
        <p class="scroll-cue" data-testid="scroll-cue">
          {hidden.right ? 'More columns: scroll the table sideways →' : '← Scroll back for the first columns'}
        </p>
      )}
      <div ref={ref} class={`table-scroll${edge}`} role="region" aria-label={caption} tabIndex={0}>
        <table class={cls ? `data-table ${cls}` : 'data-table'}>
          <caption>{caption}</caption>
          {children}
        </table>
      </div>
    </>
  );
}

/** Numbered source texts referred to as [n] in the tables above. */
export function SourceNotes({ items, label = 'Sources' }: { items: readonly string[]; label?: string }) {
  if (items.length === 0) return null;
  return (
    <div class="source-notes">
      <p class="source-notes-title">{label}</p>
      <ul>
        {items.map((s, i) => (
          <li key={i}>
            <span class="source-number">[{i + 1}]</span> {s}
          </li>
        ))}
      </ul>
    </div>
  );
}
