import type { MemberResult } from '../../physics/beam/result';
import type { MemberBuild } from '../../kinds/common/types';
import { type CautionModel, cautionsFor } from '../../text/cautions';
import { assumptionLines, meshText, tensionText } from './assumptions';
import type { DisplayUnits } from './display-units';

/** Solver warnings first, then how the answer was reached: beam theory, mesh, axial load. */
export function DiagnosticsPanel({ member, units, inputWarnings = [] }: { member: MemberResult; units: DisplayUnits; inputWarnings?: readonly string[] }) {
  const tension = tensionText(member, units);
  return (
    <section class="results-block" aria-labelledby="diagnostics-title">
      <h2 id="diagnostics-title">Warnings and solver report</h2>
      {inputWarnings.length > 0 && (
        <ul class="warning-list" data-testid="input-warnings">
          {inputWarnings.map((w) => (
            <li key={w}>
              <strong>Warning:</strong> {w}
            </li>
          ))}
        </ul>
      )}
      {member.warnings.length > 0 ? (
        <ul class="warning-list">
          {member.warnings.map((w) => (
            <li key={w}>
              <strong>Warning:</strong> {w}
            </li>
          ))}
        </ul>
      ) : (
        <p>No warnings from the solver.</p>
      )}
      <dl class="facts">
        <dt>Beam theory</dt>
        <dd>{member.beamTheory === 'timoshenko' ? 'Timoshenko (shear and rotary inertia)' : 'Euler–Bernoulli'}</dd>
        <dt>Mesh</dt>
        <dd>{meshText(member)}</dd>
        {tension && (
          <>
            <dt>Axial load</dt>
            <dd>{tension}</dd>
          </>
        )}
      </dl>
    </section>
  );
}

export function AssumptionsPanel({ member, build }: { member: MemberResult; build: MemberBuild }) {
  return (
    <section class="results-block" aria-labelledby="assumptions-title">
      <h2 id="assumptions-title">Assumptions</h2>
      <ul class="plain-list">
        {assumptionLines(member, build).map((l) => (
          <li key={l}>{l}</li>
        ))}
      </ul>
    </section>
  );
}

/** The full cautions, always shown with results (and in the report); `model` picks the model-limits wording. */
export function CautionsPanel({ model = 'beam' }: { model?: CautionModel }) {
  return (
    <section class="panel cautions-panel" aria-labelledby="cautions-panel-title">
      <h2 id="cautions-panel-title">Cautions</h2>
      <ol class="cautions-list">
        {cautionsFor(model).map((c) => (
          <li key={c.title}>
            <h3>{c.title}</h3>
            <p>{c.text}</p>
          </li>
        ))}
      </ol>
    </section>
  );
}
