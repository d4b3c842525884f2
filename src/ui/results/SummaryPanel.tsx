import type { MemberKind } from '../../case';
import type { UnitSystem } from '../../units';
import type { BeamSolved } from '../../app/solve-case';
import { summarise } from './summary';
import { VerdictBadge } from './VerdictBadge';

type Solved = BeamSolved;

/** The answer in a few lines: verdict (word and icon), what drives it, lowest frequencies, lock-in onset. */
export function SummaryPanel({ kind, system, answer, speedUnit }: { kind: MemberKind; system: UnitSystem; answer: Solved; speedUnit?: string }) {
  const s = summarise(kind, system, answer, speedUnit);
  return (
    <section class="panel results-summary" aria-labelledby="results-summary-title">
      <h2 id="results-summary-title">Summary</h2>
      {s.verdict ? (
        <p class="summary-verdict">
          <span class="summary-label">Resonance verdict:</span> <VerdictBadge verdict={s.verdict} />
        </p>
      ) : (
        <p class="summary-verdict">
          <span class="summary-label">Resonance verdict:</span> none (frequencies only)
        </p>
      )}
      {s.verdictLine && <p>{s.verdictLine}</p>}
      <p class="summary-frequencies">{s.frequencyLine}</p>
      {s.onsetLine && <p class="summary-onset">{s.onsetLine}</p>}
      {s.severityLine && (
        <p class="summary-severity" data-testid="severity">
          {s.severityLine}
        </p>
      )}
      {s.notes.map((n) => (
        <p key={n} class="summary-note">{n}</p>
      ))}
    </section>
  );
}

/** A failed solve in plain words. */
export function FailurePanel({ title, text }: { title: string; text: string }) {
  return (
    <section class="panel results-failure" role="alert">
      <h2>{title}</h2>
      <p>{text}</p>
      <p>Change the inputs on the Member form; the results update as you type.</p>
    </section>
  );
}
