import { useBand } from '../state/band-context';
import { hzRange } from '../results/band-rows';
import { VerdictBadge } from '../results/VerdictBadge';

/** The band in the answer bar: the lowest mode's band and the verdict over it, or that it is being worked out. */
export function AnswerBarBand() {
  const [state, band] = useBand();
  if (state.status === 'none') return null;
  const a = state.answer;
  if (state.status === 'working' || !band.current() || !a || !a.ok || !a.band) {
    return <span class="answer-bar-band">{state.status === 'failed' ? 'no band: see the ranges' : 'band…'}</span>;
  }
  const first = (a.band.wet ?? a.band.dry).modes[0];
  return (
    <span class="answer-bar-band" data-testid="answer-bar-band">
      Over the ranges <strong>{hzRange(first.lowHz, first.highHz)}</strong>
      {a.verdict && <VerdictBadge verdict={a.verdict.bandVerdict} />}
    </span>
  );
}
