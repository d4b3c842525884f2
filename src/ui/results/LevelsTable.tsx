import type { MemberBuild } from '../../kinds/common/types';
import type { DisplayUnits } from './display-units';
import { levelRows, stretchRows } from './landmark-rows';
import { ScrollTable } from './ScrollTable';

/** Levels and stretches of the member in the user's units: the legend of the schematic as text. */
export function LevelsTable({ build, units }: { build: MemberBuild; units: DisplayUnits }) {
  const levels = levelRows(build, units);
  const stretches = stretchRows(build, units);
  const anyOutside = levels.some((l) => l.outside);
  return (
    <div class="levels">
      <ScrollTable caption={`Levels along the member, z from the ${build.origin}`}>
        <thead>
          <tr>
            <th scope="col">Level</th>
            <th scope="col">z</th>
          </tr>
        </thead>
        <tbody>
          {levels.map((l, i) => (
            <tr key={i}>
              <th scope="row">{l.label}{l.outside ? ' *' : ''}</th>
              <td>{l.z}</td>
            </tr>
          ))}
        </tbody>
      </ScrollTable>
      {anyOutside && <p class="table-note">* Outside the member, so not drawn on the schematic.</p>}
      {stretches.length > 0 && (
        <ScrollTable caption="Stretches along the member">
          <thead>
            <tr>
              <th scope="col">Stretch</th>
              <th scope="col">z from–to</th>
            </tr>
          </thead>
          <tbody>
            {stretches.map((s, i) => (
              <tr key={i}>
                <th scope="row">{s.label}</th>
                <td>{s.range}</td>
              </tr>
            ))}
          </tbody>
        </ScrollTable>
      )}
    </div>
  );
}
