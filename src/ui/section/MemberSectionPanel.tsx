import './section.css';
import { useMemo } from 'preact/hooks';
import type { MemberModel } from '../../physics/beam/model';
import { formatQuantity, type UnitSystem } from '../../units';
import { formatSig } from '../format/numbers';
import { useServices } from '../state/context';
import { sectionFromMember } from './from-member';
import { mapView } from './map-grid';
import { mapDisplay } from './map-values';
import { useSectionSolve } from './use-section-solve';
import { SURROUND_WORDS } from './view-words';
import { MapLegend } from './MapLegend';
import { MemberSectionLink } from './MemberSectionLink';
import { SectionPlot } from './SectionPlot';

/**
 * The member's submerged section on the Results screen: drawn to scale in its surroundings with the flow-speed
 * map for sway (the motion of bending), and its Ca. The full numbers are one tap away in the Section view.
 */
export function MemberSectionPanel({ model, system }: { model: MemberModel; system: UnitSystem }) {
  const { sectionSolver } = useServices();
  // The member's own section input, solved as the member engine sees it (no rounding through the editor's text).
  const s = useMemo(() => sectionFromMember(model), [model]);
  const input = s?.input ?? null;
  const view = useMemo(() => (input ? mapView(input) : null), [input]);
  const map = useMemo(() => (view ? { body: 0, motion: 'x' as const, grid: view.grid } : null), [view]);
  const solve = useSectionSolve(sectionSolver, input, map, { energyCheck: false });
  const unit = system === 'si' ? 'mm' : 'in';
  const formatLength = (m: number) => formatQuantity(m, unit, 4);
  const shown = solve.shown;
  const display = useMemo(() => (shown?.field ? mapDisplay(shown.field, shown.input, 'speed', (m) => formatQuantity(m, unit, 3)) : null), [shown, unit]);
  if (!s || !input || !view) return null;
  const body = shown?.result.bodies[0];
  return (
    <section class="results-block member-section" aria-labelledby="member-section-title">
      <h2 id="member-section-title">Submerged section and the flow around it</h2>
      <p class="field-help">{s.about}</p>
      <div class="member-section-row">
        <SectionPlot
          input={input}
          box={view.box}
          field={shown?.field ?? null}
          display={display}
          body={0}
          motion="x"
          stale={!shown}
          label="The member's submerged section to scale, with the liquid speed around it as it sways"
          formatLength={formatLength}
          axes={SURROUND_WORDS[s.plan ? 'plan' : 'elevation'].axes}
        />
        <div>
          {display && <MapLegend display={display} quantity="speed" />}
          {body && (
            <p data-testid="member-section-ca">
              Sway Ca = {formatSig(body.caX, 4)} (reference area π a², a = {formatLength(body.referenceHalfWidthXM)}); added mass / displaced liquid ={' '}
              {formatSig(body.addedToDisplacedX, 4)}.
            </p>
          )}
          {solve.phase === 'failed' && <p class="field-error">{solve.message}</p>}
          <MemberSectionLink model={model} label="Open in the Section view" />
        </div>
      </div>
    </section>
  );
}
