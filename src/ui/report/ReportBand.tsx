import { useBand } from '../state/band-context';
import { BandPanel } from '../results/BandPanel';

/** The report's band section: the ranges, the verdict over the band, the band table and the sensitivity chart. */
export function ReportBand() {
  const [state, band] = useBand();
  if (state.status === 'none') return null;
  return (
    <div class="report-section report-band" data-testid="report-band">
      <BandPanel state={state} current={band.current()} />
    </div>
  );
}
