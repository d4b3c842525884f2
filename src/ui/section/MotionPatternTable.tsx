import { useState } from 'preact/hooks';
import type { SectionResult } from '../../physics/section';
import { unitLabel } from '../../units';
import { patternAddedMass, type MotionPattern } from './motion-pattern';
import { num, type SectionUnits } from './numbers';

const PATTERNS: readonly { value: MotionPattern; label: string }[] = [
  { value: 'together', label: 'Together' },
  { value: 'opposition', label: 'In opposition' },
  { value: 'alone', label: 'One at a time' },
];

/**
 * For two or more bodies: the added mass each feels when they move together, in opposition (neighbours in body
 * order move opposite ways) or one at a time (the others held still), from the full matrix above.
 */
// One Section view per page, so one radio group name serves.
export function MotionPatternTable({ result, units }: { result: SectionResult; units: SectionUnits }) {
  const [pattern, setPattern] = useState<MotionPattern>('together');
  const n = result.bodies.length;
  if (n < 2) return null;
  const x = patternAddedMass(result.addedMass, pattern, 'x');
  const y = patternAddedMass(result.addedMass, pattern, 'y');
  const u = unitLabel(units.perLength);
  return (
    <div class="motion-pattern" data-testid="motion-pattern">
      <fieldset class="pattern-choice">
        <legend>How the bodies move</legend>
        {PATTERNS.map((p) => (
          <label key={p.value} class="pattern-radio">
            <input type="radio" name="section-motion-pattern" value={p.value} checked={pattern === p.value} onChange={() => setPattern(p.value)} />
            {p.label}
          </label>
        ))}
      </fieldset>
      <div class="section-table-box" role="region" aria-label="Added mass in the chosen motion" tabIndex={0}>
        <table class="section-table">
          <caption>Added mass each body feels, {PATTERNS.find((p) => p.value === pattern)!.label.toLowerCase()}, per metre of length</caption>
          <thead>
            <tr>
              <th scope="col">Body</th>
              <th scope="col">Sway (x), {u}</th>
              <th scope="col">Heave (y), {u}</th>
            </tr>
          </thead>
          <tbody>
            {x.perBody.map((v, k) => (
              <tr key={k}>
                <th scope="row">Body {k + 1}{pattern === 'opposition' && k % 2 === 1 ? ' (opposite way)' : ''}</th>
                <td data-testid={`pattern-x-${k}`}>{num(v, units.perLength)}</td>
                <td>{num(y.perBody[k], units.perLength)}</td>
              </tr>
            ))}
            <tr>
              <th scope="row">All bodies</th>
              <td data-testid="pattern-x-total">{num(x.total, units.perLength)}</td>
              <td>{num(y.total, units.perLength)}</td>
            </tr>
          </tbody>
        </table>
      </div>
      <p class="field-help">
        Each body's value is the force on it per unit acceleration of the pattern, its own term plus its coupling with the others; the last row is
        the pattern's total (twice the liquid's kinetic energy at unit speed). In opposition, neighbouring bodies in the list move opposite ways.
      </p>
    </div>
  );
}
