import { useBand } from '../state/band-context';
import { BandPanel } from './BandPanel';

/** The band panel of the open case, following its band model. */
export function LiveBandPanel() {
  const [state, band] = useBand();
  return <BandPanel state={state} current={band.current()} />;
}
