import { switchLines } from '../../app/band-words';
import type { FormRange } from '../../forms/ranges';
import type { BandVerdict } from '../../physics/uncertain';
import { VerdictBadge } from './VerdictBadge';

/**
 * The resonance verdict over the band beside the likely-value verdict, each a word with an icon, and where a
 * verdict would change along the input that moves the deciding mode most.
 */
export function BandVerdictBlock({ verdict, ranges, compact = false }: { verdict: BandVerdict; ranges: readonly FormRange[]; compact?: boolean }) {
  const lines = switchLines(verdict, ranges);
  return (
    <div class="band-verdict" data-testid="band-verdict">
      <p class="band-verdict-pair">
        <span class="band-verdict-item">
          <span class="summary-label">At the likely values:</span> <span data-testid="band-likely-verdict"><VerdictBadge verdict={verdict.likelyVerdict} /></span>
        </span>
        <span class="band-verdict-item">
          <span class="summary-label">Over the ranges:</span> <span data-testid="band-band-verdict"><VerdictBadge verdict={verdict.bandVerdict} /></span>
        </span>
      </p>
      {lines.length > 0 && (
        <ul class="band-switches" data-testid="band-switches">
          {(compact ? lines.slice(0, 2) : lines).map((l) => (
            <li key={l}>{l}</li>
          ))}
        </ul>
      )}
    </div>
  );
}
