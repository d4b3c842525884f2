import type { PlateSolved } from '../../app/solve-case';
import { VerdictBadge } from '../results/VerdictBadge';
import { summarisePlate } from './plate-summary';

/** The plate's answer in a few lines: verdict (word and icon), what drives it, lowest frequencies. */
export function PlateSummaryPanel({ answer }: { answer: PlateSolved }) {
  const s = summarisePlate(answer);
  return (
    <section class="panel results-summary" aria-labelledby="results-summary-title">
      <h2 id="results-summary-title">Summary</h2>
      <p class="summary-verdict">
        <span class="summary-label">Resonance verdict:</span> {s.verdict ? <VerdictBadge verdict={s.verdict} /> : 'none (frequencies only)'}
      </p>
      {s.verdictLine && <p>{s.verdictLine}</p>}
      <p class="summary-frequencies" data-testid="plate-frequency-line">{s.frequencyLine}</p>
      {s.notes.map((n) => (
        <p key={n} class="summary-note">{n}</p>
      ))}
    </section>
  );
}
