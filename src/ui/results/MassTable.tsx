import type { MemberResult } from '../../physics/beam/result';
import { type DisplayUnits, sentence, unitText } from './display-units';
import { ScrollTable } from './ScrollTable';
import { addedMassLines, referenceAreas, refMark, zoneCells } from './zone-rows';

/**
 * Mass per metre by zone, Ca with its reference area, and the added-mass method and factors with sources
 * (`withMethod` false where the method is listed elsewhere, as in the printed record's method section).
 */
export function MassTable({ member, units, withMethod = true }: { member: MemberResult; units: DisplayUnits; withMethod?: boolean }) {
  const refs = referenceAreas(member.zones);
  const rows = member.zones.map((z) => zoneCells(z, units, refs));
  const mpl = unitText(units.massPerLength);
  const lines = addedMassLines(member, units);
  const anyTaper = rows.some((r) => r.tapered);
  return (
    <section class="results-block" aria-labelledby="mass-title">
      <h2 id="mass-title">Mass per {units.length === 'm' ? 'metre' : 'foot'} by zone</h2>
      <ScrollTable caption={`Mass per length by zone (${mpl}); z in ${unitText(units.length)}`} class="mass-table">
        <thead>
          <tr>
            <th scope="col">z from–to ({unitText(units.length)})</th>
            <th scope="col">In liquid</th>
            <th scope="col">Structure ({mpl})</th>
            <th scope="col">Contents ({mpl})</th>
            <th scope="col">Coating or growth ({mpl})</th>
            <th scope="col">Added mass ({mpl})</th>
            <th scope="col">Ca</th>
            <th scope="col">Added / displaced liquid</th>
            <th scope="col">Added / structure</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => (
            <tr key={i}>
              <th scope="row">{r.range}{r.tapered ? ' †' : ''}</th>
              <td>{r.submerged}</td>
              <td>{r.structure}</td>
              <td>{r.contents}</td>
              <td>{r.coating}</td>
              <td>{r.added}</td>
              <td>{r.ca}</td>
              <td>{r.addedToDisplaced}</td>
              <td>{r.addedToStructural}</td>
            </tr>
          ))}
        </tbody>
      </ScrollTable>
      <div class="table-note">
        {refs.length === 1 && <p>Ca = added mass / (ρ × reference area), reference area {refs[0]}.</p>}
        {refs.length > 1 && (
          <p>
            Ca = added mass / (ρ × reference area), reference areas:{' '}
            {refs.map((r, i) => `${refMark(i)} ${r}`).join('; ')}.
          </p>
        )}
        {anyTaper && <p>† On a taper: values are averages over the zone.</p>}
      </div>
      {withMethod && lines.length > 0 && (
        <>
          <h3>Added mass method</h3>
          <ul class="sourced-list">
            {lines.map((l) => (
              <li key={l.text}>
                {sentence(l.text)} <span class="source">Source: {sentence(l.source)}</span>
              </li>
            ))}
          </ul>
        </>
      )}
    </section>
  );
}
