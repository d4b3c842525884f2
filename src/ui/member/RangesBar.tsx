import type { Case } from '../../case';
import { applicableRanges } from '../../forms/ranges';
import { kindOf } from '../../kinds/registry';
import { rangesOf } from '../../kinds/ranges-registry';
import type { AppModel } from '../state/app-model';
import { allRangesOff, withDefaultRanges } from './ranges-edit';
import { withUnitReader } from './with-units';

/**
 * Ranges on the uncertain inputs in one line: how many are on, the trade's default ranges in one tap, and all
 * off. Each uncertain field also has its own switch and low / high fields under it.
 */
export function RangesBar({ doc, model, disabled }: { doc: Case; model: AppModel; disabled: boolean }) {
  const offered = applicableRanges(kindOf(doc.kind).form.fields, rangesOf(doc.kind), doc.inputs);
  if (offered.length === 0) return null;
  const on = Object.entries(doc.ranges ?? {}).filter(([k, r]) => r.on && offered.some((d) => d.key === k)).length;
  return (
    <div class="ranges-bar" data-testid="ranges-bar">
      <p>
        <strong>Ranges on uncertain inputs</strong>: {on === 0 ? 'none yet' : `${on} on`}. Give a low and a high value beside the likely one to see the frequency band, what drives it and the verdict over the band.
      </p>
      <div class="toolbar">
        <button type="button" class="btn" disabled={disabled} onClick={() => withUnitReader(() => model.edit(withDefaultRanges))}>Use the default ranges</button>
        {on > 0 && <button type="button" class="btn" disabled={disabled} onClick={() => model.edit(allRangesOff)}>Switch all ranges off</button>}
      </div>
    </div>
  );
}
