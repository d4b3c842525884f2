import type { Verdict } from '../../physics/excitation/verdict';
import { VERDICT_WORDS } from '../../physics/excitation/verdict';

/**
 * A resonance verdict as a word with an icon shape — circle with a tick (clear), triangle with "!" (close),
 * octagon with a cross (inside band) — so it reads in sun, in print and without colour.
 */
export function VerdictIcon({ verdict, size = 20 }: { verdict: Verdict; size?: number }) {
  return (
    <svg class={`verdict-icon verdict-${verdict}`} width={size} height={size} viewBox="0 0 20 20" aria-hidden="true">
      {verdict === 'clear' && (
        <>
          <circle cx="10" cy="10" r="8.5" />
          <path d="M5.5 10.5 L8.8 13.6 L14.5 6.8" class="verdict-mark" />
        </>
      )}
      {verdict === 'close' && (
        <>
          <path d="M10 1.5 L19 18 L1 18 Z" />
          <path d="M10 7 V12.5 M10 14.6 V15.6" class="verdict-mark" />
        </>
      )}
      {verdict === 'inside-band' && (
        <>
          <path d="M6.5 1.5 H13.5 L18.5 6.5 V13.5 L13.5 18.5 H6.5 L1.5 13.5 V6.5 Z" />
          <path d="M6.5 6.5 L13.5 13.5 M13.5 6.5 L6.5 13.5" class="verdict-mark" />
        </>
      )}
    </svg>
  );
}

export function VerdictBadge({ verdict }: { verdict: Verdict }) {
  return (
    <span class={`verdict verdict-${verdict}`} data-verdict={verdict}>
      <VerdictIcon verdict={verdict} />
      <span>{VERDICT_WORDS[verdict]}</span>
    </span>
  );
}
