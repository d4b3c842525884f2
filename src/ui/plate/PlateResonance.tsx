import type { PlateResult } from '../../physics/plate';
import type { PlateCheck, PlateScreening } from '../../kinds/plate-panel/screen';
import type { Verdict } from '../../physics/excitation/verdict';
import { SLOSHING_SOURCE } from '../../kinds/plate-panel/screen';
import { formatHz } from '../format/numbers';
import { marginText } from '../results/display-units';
import { ScrollTable } from '../results/ScrollTable';
import { VerdictBadge } from '../results/VerdictBadge';

/** The tank's lowest sloshing frequencies: excitations near which the wet frequencies do not hold. */
export function SloshingList({ result }: { result: PlateResult }) {
  if (!result.sloshing || result.sloshing.length === 0) return null;
  return (
    <div data-testid="plate-sloshing">
      <h3>Sloshing of the tank’s liquid</h3>
      <p>
        Keep the plate’s wet frequencies and any forcing clear of these: near them the liquid’s surface moves, the “no sloshing” assumption of the wet
        solve fails, and the waves can drive the plate. <span class="source">Source: {SLOSHING_SOURCE}.</span>
      </p>
      <ul class="plain-list">
        {result.sloshing.map((s) => (
          <li key={s.description}>
            <strong>{formatHz(s.frequencyHz)}</strong>: {s.description}
          </li>
        ))}
      </ul>
    </div>
  );
}

type Row = { mode: number; c: PlateCheck; key: string };
const SEVERITY: Readonly<Record<Verdict, number>> = { 'inside-band': 2, close: 1, clear: 0 };

/** For each excitation, the mode that governs it: the worst verdict, the smallest margin among equals. */
export function governingPlateRows(rows: readonly Row[]): Row[] {
  const best = new Map<string, Row>();
  for (const r of rows) {
    const b = best.get(r.c.label);
    const worse = b && (SEVERITY[r.c.verdict] > SEVERITY[b.c.verdict] || (SEVERITY[r.c.verdict] === SEVERITY[b.c.verdict] && Math.abs(r.c.marginPercent) < Math.abs(b.c.marginPercent)));
    if (!b || worse) best.set(r.c.label, r);
  }
  return [...best.values()];
}

/**
 * Every mode against every machinery order and sloshing frequency, with its verdict, margin and source;
 * `governing` (the printed record) keeps only the governing mode of each excitation.
 */
export function PlateResonance({ screening, result, governing = false }: { screening: PlateScreening | null; result: PlateResult; governing?: boolean }) {
  const all: Row[] = screening ? screening.modes.flatMap((m) => m.checks.map((c, i) => ({ mode: m.modeIndex + 1, c, key: `${m.modeIndex}-${i}` }))) : [];
  const rows = governing ? governingPlateRows(all) : all;
  const what = governing ? 'Governing mode of each excitation (every mode on the Results screen)' : 'Each mode against machinery and sloshing';
  return (
    <section class="results-block" aria-labelledby="plate-resonance-title">
      <h2 id="plate-resonance-title">Resonance</h2>
      {screening ? (
        <ScrollTable caption={`${what} (±${Math.round(screening.separationMargin.value * 100)} % separation: ${screening.separationMargin.source})`} class="checks-table">
          <thead>
            <tr>
              <th scope="col">Mode</th>
              <th scope="col">Excitation</th>
              <th scope="col">Frequency compared</th>
              <th scope="col">Verdict</th>
              <th scope="col">Margin</th>
              <th scope="col">Why</th>
            </tr>
          </thead>
          <tbody>
            {rows.map(({ mode, c, key }) => (
              <tr key={key}>
                <th scope="row">{mode}</th>
                <td>{c.label}</td>
                <td>
                  {c.frequencyBasis} {formatHz(c.frequencyHz)}
                </td>
                <td>
                  <VerdictBadge verdict={c.verdict} />
                </td>
                <td>{marginText(c.marginPercent)}</td>
                <td>
                  {c.reason}. <span class="source">Source: {c.source}.</span>
                </td>
              </tr>
            ))}
          </tbody>
        </ScrollTable>
      ) : (
        <p>Not screened: enter a nearby machine on the Member screen.</p>
      )}
      {screening?.notes.map((n) => (
        <p key={n} class="table-note">{n}</p>
      ))}
      <SloshingList result={result} />
    </section>
  );
}
