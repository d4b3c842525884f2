import type { ComponentChildren } from 'preact';

/**
 * A table that scrolls sideways inside its own box on narrow screens (never the whole page). The box is
 * focusable and named by the caption, so keyboard users can scroll it too.
 */
export function ScrollTable({ caption, class: cls, children }: { caption: string; class?: string; children: ComponentChildren }) {
  return (
    <div class="table-scroll" role="region" aria-label={caption} tabIndex={0}>
      <table class={cls ? `data-table ${cls}` : 'data-table'}>
        <caption>{caption}</caption>
        {children}
      </table>
    </div>
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
