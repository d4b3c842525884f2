import type { SectionInput, SectionResult } from '../../physics/section';
import type { UnitSystem } from '../../units';
import { CAUTION_LINE } from '../../text/cautions';
import { BodyTable, EnergyTable, MatrixTable } from './NumberTables';
import { describeBody, sectionUnits } from './numbers';
import { MotionPatternTable } from './MotionPatternTable';

interface Props {
  input: SectionInput;
  result: SectionResult;
  system: UnitSystem;
  onSystem: (s: UnitSystem) => void;
  /** The energy cross-check is still running. */
  checking: boolean;
  stale: boolean;
  formatLength: (m: number) => string;
}

/** The numbers of the last solve: per body, the full matrix, the energy cross-check and the method notes. */
export function SectionNumbers({ input, result, system, onSystem, checking, stale, formatLength }: Props) {
  const units = sectionUnits(system);
  return (
    <section class={`section-numbers${stale ? ' stale' : ''}`} aria-labelledby="sec-numbers-title">
      <div class="section-numbers-head">
        <h2 id="sec-numbers-title">Added mass</h2>
        <div class="segmented" role="group" aria-label="Units of the numbers">
          <button type="button" class="btn" aria-pressed={system === 'si'} onClick={() => onSystem('si')}>kg/m</button>
          <button type="button" class="btn" aria-pressed={system === 'us'} onClick={() => onSystem('us')}>lb/ft</button>
        </div>
      </div>
      {stale && <p class="stale-note">Out of date: these numbers are for the section as it was before your last change.</p>}
      <p class="section-caution">
        <span aria-hidden="true">⚠ </span>
        {CAUTION_LINE}
      </p>
      <p class="field-help">
        Per metre of member length, two-dimensional potential flow. Ca = added mass / (ρ π a²), a = half the wetted width across the
        motion; the reference area π a² is given for each motion.
      </p>
      {result.bodies.map((_, k) => (
        <BodyTable key={k} result={result} k={k} units={units} describe={describeBody(input.bodies[k], formatLength)} />
      ))}
      <MatrixTable result={result} units={units} />
      <MotionPatternTable result={result} units={units} />
      {result.energyChecks.length > 0 ? (
        <>
          <EnergyTable result={result} units={units} />
          <p class="field-help">
            The field integral is summed on a grid over the liquid, finer next to the outlines, with the far-field tail added in open
            water. Motions that move no liquid (a circle turning about its centre) and blocked motions are not checked.
          </p>
        </>
      ) : (
        <p class="field-help">{checking ? 'Kinetic-energy cross-check: computing on a field grid…' : 'Kinetic-energy cross-check: not available.'}</p>
      )}
      <details class="more">
        <summary>How these were computed</summary>
        <ul class="section-notes">
          {result.notes.map((n) => (
            <li key={n}>{n}.</li>
          ))}
          <li>
            Panels: {result.panelsFine} at the finest resolution, {result.panelsCoarse} at the next coarser; matrix asymmetry before symmetrising{' '}
            {result.asymmetry.toExponential(1)} of the largest diagonal term.
          </li>
        </ul>
      </details>
    </section>
  );
}
