import type { ComponentChildren } from 'preact';

/** A screen whose capability is still being built: says what will be here, shows no numbers. */
export function Placeholder({ title, children }: { title: string; children: ComponentChildren }) {
  return (
    <section class="screen" aria-labelledby="screen-title">
      <h1 id="screen-title" tabIndex={-1}>{title}</h1>
      <div class="panel notice">{children}</div>
    </section>
  );
}
