import { useBand } from '../state/band-context';
import { BandStatus } from '../results/BandPanel';
import { BandVerdictBlock } from '../results/BandVerdictBlock';
import { hzRange } from '../results/band-rows';

/** The band in the Member answer panel: lowest mode's band, the verdict over the band beside the likely one. */
export function QuickBand() {
  const [state, band] = useBand();
  if (state.status === 'none') return null;
  const a = state.answer;
  const current = band.current();
  const ok = a && a.ok && a.band ? a : null;
  const first = ok?.band ? (ok.band.wet ?? ok.band.dry).modes[0] : null;
  return (
    <div class={`quick-band${current ? '' : ' stale'}`} data-testid="quick-band">
      <BandStatus state={state} current={current} />
      {ok && first && (
        <>
          <p class="quick-band-range">
            Lowest {ok.band!.wet ? 'wet' : 'dry'} frequency over the ranges: <strong data-testid="quick-band-range">{hzRange(first.lowHz, first.highHz)}</strong>
          </p>
          {ok.verdict && <BandVerdictBlock verdict={ok.verdict} ranges={ok.ranges} compact />}
        </>
      )}
    </div>
  );
}
