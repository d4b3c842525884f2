import type { PlateBuild } from '../../kinds/common/types';
import type { PlateResult } from '../../physics/plate';
import { sentence } from '../results/display-units';

/** How the plate was solved, when the answer holds, and the modelling choices (the build's notes). */
export function PlateMethodPanel({ result, build }: { result: PlateResult; build: PlateBuild }) {
  return (
    <section class="results-block" aria-labelledby="plate-method-title">
      <h2 id="plate-method-title">Method, validity and assumptions</h2>
      <h3>Method</h3>
      <ul class="plain-list">
        {result.method.map((l) => (
          <li key={l}>{sentence(l)}</li>
        ))}
      </ul>
      <h3>Validity</h3>
      <ul class="plain-list">
        {result.validity.map((l) => (
          <li key={l}>{sentence(l)}</li>
        ))}
      </ul>
      <h3>Assumptions and notes</h3>
      <ul class="plain-list">
        {[...build.notes, ...result.notes].map((l) => (
          <li key={l}>{sentence(l)}</li>
        ))}
      </ul>
    </section>
  );
}
