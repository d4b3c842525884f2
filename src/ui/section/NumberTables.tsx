import type { ComponentChildren } from 'preact';
import type { SectionResult } from '../../physics/section';
import { unitLabel } from '../../units';
import { bodyRows, dofLabel, energyRows, matrixCells, MOTION_WORDS, areaText, withUnit, type SectionUnits } from './numbers';

/** A table in its own sideways-scrolling box (never the page), named by its caption for keyboard users. */
function Table({ caption, cls, children }: { caption: string; cls?: string; children: ComponentChildren }) {
  return (
    <div class="section-table-box" role="region" aria-label={caption} tabIndex={0}>
      <table class={`section-table${cls ? ` ${cls}` : ''}`}>
        <caption>{caption}</caption>
        {children}
      </table>
    </div>
  );
}

/** One body: added mass, Ca with its reference area, ratio to displaced liquid and error estimate per motion. */
export function BodyTable({ result, k, units, describe }: { result: SectionResult; k: number; units: SectionUnits; describe: string }) {
  const b = result.bodies[k];
  return (
    <>
      <Table caption={`Body ${k + 1}: ${describe}`} cls="section-body-table">
        <thead>
          <tr>
            <th scope="col">Per metre of length</th>
            <th scope="col">{MOTION_WORDS.x}</th>
            <th scope="col">{MOTION_WORDS.y}</th>
            <th scope="col">{MOTION_WORDS.rotation}</th>
          </tr>
        </thead>
        <tbody>
          {bodyRows(result, k, units).map((r) => (
            <tr key={r.label}>
              <th scope="row">{r.label}</th>
              <td>{r.x}</td>
              <td>{r.y}</td>
              <td>{r.rotation}</td>
            </tr>
          ))}
        </tbody>
      </Table>
      <p class="field-help">
        Displaced liquid: {withUnit(b.displacedMassKgPerM, units.perLength)} (wetted area {areaText(b.wettedAreaM2, units)}).
        {b.blockedDofs.length > 0 && ` · Blocked (resting on a wall, cannot move off it): ${b.blockedDofs.map((d) => MOTION_WORDS[d]).join(', ')}.`}
      </p>
    </>
  );
}

/** The full 3K×3K matrix with labelled rows and columns. */
export function MatrixTable({ result, units }: { result: SectionResult; units: SectionUnits }) {
  const cells = matrixCells(result, units);
  const n = cells.length;
  return (
    <>
      <Table caption={`Added-mass matrix, ${n} × ${n}, per metre of length`} cls="section-matrix">
        <thead>
          <tr>
            <td />
            {cells.map((_, j) => (
              <th key={j} scope="col">{dofLabel(j)}</th>
            ))}
          </tr>
        </thead>
        <tbody>
          {cells.map((row, i) => (
            <tr key={i}>
              <th scope="row">{dofLabel(i)}</th>
              {row.map((c, j) => (
                <td key={j} class={i === j ? 'diag' : undefined}>{c}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </Table>
      <p class="field-help">
        x, y: sway and heave; θ: rotation about the body's centre. Units: x/y with x/y {unitLabel(units.perLength)}; x/y with θ{' '}
        {unitLabel(units.coupling)}; θ with θ {unitLabel(units.inertia)}. Off-diagonal terms between bodies are their hydrodynamic coupling.
      </p>
    </>
  );
}

/** Boundary integral (the reported value) beside the field integral ρ∫|∇φ|² dA for each diagonal term. */
export function EnergyTable({ result, units }: { result: SectionResult; units: SectionUnits }) {
  const rows = energyRows(result.energyChecks, units);
  return (
    <Table caption="Kinetic-energy cross-check of the diagonal terms">
      <thead>
        <tr>
          <th scope="col">Term</th>
          <th scope="col">Boundary integral</th>
          <th scope="col">Field integral ρ∫|∇φ|² dA</th>
          <th scope="col">Difference</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.label}>
            <th scope="row">{r.label}</th>
            <td>{r.boundary} {r.unit}</td>
            <td>{r.field} {r.unit}</td>
            <td>
              {r.difference}
              {r.flag && (
                <>
                  {' '}
                  <span aria-hidden="true">⚠</span> <span class="field-help">{r.flag}</span>
                </>
              )}
            </td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
