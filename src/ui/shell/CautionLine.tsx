import { CAUTION_LINE } from '../../text/cautions';
import { hashFor } from './router';

/** The short caution shown on every screen, linking to the full cautions. */
export function CautionLine() {
  return (
    <aside class="caution-line" aria-label="Caution" data-testid="caution-line">
      <span class="caution-icon" aria-hidden="true">⚠</span>
      <span>{CAUTION_LINE}</span> <a href={hashFor('cautions')}>Read the cautions</a>
    </aside>
  );
}
