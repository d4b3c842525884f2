/** The measurements of a case over the years: a table and a small chart of frequency against date. */
import type { CaseMeasurement } from '../../case';

const W = 480;
const H = 140;

export function MeasurementTrend({ measurements }: { measurements: readonly CaseMeasurement[] }) {
  if (measurements.length === 0) return null;
  const sorted = [...measurements].sort((a, b) => a.takenAt.localeCompare(b.takenAt));
  const ts = sorted.map((m) => Date.parse(m.takenAt));
  const fs = sorted.map((m) => m.frequencyHz);
  const t0 = Math.min(...ts);
  const t1 = Math.max(...ts, t0 + 1);
  const lo = Math.min(...sorted.map((m) => m.frequencyHz - m.uncertaintyHz));
  const hi = Math.max(...sorted.map((m) => m.frequencyHz + m.uncertaintyHz), lo * 1.001 + 1e-9);
  const x = (t: number) => 30 + ((W - 60) * (t - t0)) / (t1 - t0);
  const y = (f: number) => 10 + ((H - 30) * (hi - f)) / (hi - lo);
  return (
    <div class="panel" data-testid="measurement-trend">
      <h2>Measurements of this member</h2>
      <table>
        <thead>
          <tr><th>Date</th><th>Frequency, Hz</th><th>Mode</th><th>By</th><th>Elevation</th><th>Water level</th><th>From</th></tr>
        </thead>
        <tbody>
          {sorted.map((m) => (
            <tr key={m.id}>
              <td>{m.takenAt.slice(0, 16).replace('T', ' ')}</td>
              <td>{m.frequencyHz.toFixed(3)} ± {m.uncertaintyHz.toFixed(3)}</td>
              <td>{m.state} {m.mode}</td>
              <td>{m.by}</td>
              <td>{m.elevation}</td>
              <td>{m.waterLevel}</td>
              <td>{m.source === 'record' ? 'motion record (kept on the device that recorded it)' : 'typed'}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {sorted.length > 1 && (
        <svg viewBox={`0 0 ${W} ${H}`} class="trend-plot" role="img" aria-label="Measured frequency against date">
          <path d={sorted.map((_, i) => `${i === 0 ? 'M' : 'L'}${x(ts[i]).toFixed(1)},${y(fs[i]).toFixed(1)}`).join('')} fill="none" class="spectrum-line" />
          {sorted.map((m, i) => (
            <g key={m.id}>
              <line x1={x(ts[i])} x2={x(ts[i])} y1={y(m.frequencyHz + m.uncertaintyHz)} y2={y(m.frequencyHz - m.uncertaintyHz)} class="spectrum-axis" />
              <circle cx={x(ts[i])} cy={y(fs[i])} r={4} class="spectrum-peak" />
              <text x={x(ts[i])} y={H - 4} text-anchor="middle" class="spectrum-tick">{m.takenAt.slice(0, 7)}</text>
            </g>
          ))}
        </svg>
      )}
    </div>
  );
}
