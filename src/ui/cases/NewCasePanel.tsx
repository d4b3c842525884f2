import { useId, useState } from 'preact/hooks';
import { MEMBER_KINDS, type MemberKind, type UnitSystem } from '../../case';
import type { DemoCase } from '../../forms';
import { kindTitle } from './format';
import { loadNewCaseUnits, storeNewCaseUnits } from './new-case';
import { DEMO_CASES, kindOf } from '../../kinds/registry';

interface Props {
  onNew: (kind: MemberKind, system: UnitSystem) => void;
  onDemo: (demo: DemoCase) => void;
}

const UNIT_CHOICES: readonly { value: UnitSystem; label: string }[] = [
  { value: 'si', label: 'Metric (mm, m, kg)' },
  { value: 'us', label: 'US (in, ft, lb)' },
];

/** Four big buttons for a new case of each member kind, the units it starts in, and the worked demos. */
export function NewCasePanel({ onNew, onDemo }: Props) {
  const [system, setSystem] = useState<UnitSystem>(loadNewCaseUnits);
  const id = useId();

  function choose(s: UnitSystem) {
    setSystem(s);
    storeNewCaseUnits(s);
  }

  return (
    <section class="new-case" aria-labelledby={`${id}-h`}>
      <h2 id={`${id}-h`}>New case</h2>
      <fieldset class="unit-choice">
        <legend>Units for a new case</legend>
        {UNIT_CHOICES.map((u) => (
          <label key={u.value} class="radio">
            <input type="radio" name={`${id}-units`} value={u.value} checked={system === u.value} onChange={() => choose(u.value)} />
            {u.label}
          </label>
        ))}
        <p class="unit-hint">Any value can still be typed with its own unit, such as 24 in or 610 mm.</p>
      </fieldset>
      <div class="kind-buttons">
        {MEMBER_KINDS.map((kind) => (
          <button key={kind} type="button" class="btn kind-button" onClick={() => onNew(kind, system)}>
            <span class="kind-title">{kindOf(kind).title}</span>
            <span class="kind-summary">{kindOf(kind).summary}</span>
          </button>
        ))}
      </div>
      <details class="demos">
        <summary>Open a demo</summary>
        <p class="cases-muted">Worked examples in invented settings. A demo opens as a new, unsaved case: change it freely.</p>
        <ul class="demo-list">
          {DEMO_CASES.map((d) => (
            <li key={d.name}>
              <button type="button" class="btn demo-button" onClick={() => onDemo(d)}>
                <span class="kind-title">{kindTitle(d.kind)}</span>
                <span class="kind-summary">{d.name}</span>
              </button>
            </li>
          ))}
        </ul>
      </details>
    </section>
  );
}
