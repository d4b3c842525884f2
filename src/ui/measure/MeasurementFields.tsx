/** When, who, where and at what water level a measurement was taken; the typed frequency when there is no record. */
export interface MeasurementMeta {
  /** As in a datetime-local input, local time. */
  takenAt: string;
  by: string;
  elevation: string;
  waterLevel: string;
  note: string;
  typedHz: string;
  typedUncertaintyHz: string;
  mode: string;
  state: 'dry' | 'wet';
}

export function nowForInput(now = new Date()): string {
  const local = new Date(now.getTime() - now.getTimezoneOffset() * 60000);
  return local.toISOString().slice(0, 16);
}

export function MeasurementFields({ meta, fromRecord, onChange }: { meta: MeasurementMeta; fromRecord: boolean; onChange: (m: MeasurementMeta) => void }) {
  const text = (key: keyof MeasurementMeta, label: string, extra: Record<string, string> = {}) => (
    <label class="field">
      <span>{label}</span>
      <input type="text" value={meta[key]} onInput={(e) => onChange({ ...meta, [key]: (e.currentTarget as HTMLInputElement).value })} data-testid={`measure-${key}`} {...extra} />
    </label>
  );
  return (
    <div class="panel" data-testid="measurement-fields">
      <h2>The measurement</h2>
      <div class="field-grid">
        <label class="field">
          <span>Date and time</span>
          <input type="datetime-local" value={meta.takenAt} onInput={(e) => onChange({ ...meta, takenAt: (e.currentTarget as HTMLInputElement).value })} data-testid="measure-takenAt" />
        </label>
        {text('by', 'Who or what measured it')}
        {text('elevation', 'Elevation on the member')}
        {text('waterLevel', 'Water level at the time')}
        {!fromRecord && text('typedHz', 'Measured frequency, Hz', { inputMode: 'decimal' })}
        {!fromRecord && text('typedUncertaintyHz', '± uncertainty, Hz', { inputMode: 'decimal' })}
        {text('mode', 'Mode number', { inputMode: 'numeric' })}
        <label class="field">
          <span>Measured</span>
          <select value={meta.state} onChange={(e) => onChange({ ...meta, state: (e.currentTarget as HTMLSelectElement).value as 'dry' | 'wet' })} data-testid="measure-state">
            <option value="wet">wet (in the water)</option>
            <option value="dry">dry</option>
          </select>
        </label>
        {text('note', 'Note')}
      </div>
    </div>
  );
}
