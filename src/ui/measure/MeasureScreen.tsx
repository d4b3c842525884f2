/**
 * The Field check screen: a measured frequency of the member (typed, or picked from the spectrum of a motion
 * record), compared with the predicted dry and wet frequencies; one unknown back-calculated from it; the case
 * re-run with the calibrated value; and the measurements kept with the case as a trend.
 */
import { useState } from 'preact/hooks';
import { answerFigures } from '../../app/answer-figures';
import type { CaseMeasurement } from '../../case';
import { kindOf } from '../../kinds/registry';
import { analyseMotionRecord, type MotionRecord, type SpectrumAnalysis } from '../../physics/signal';
import { MEASUREMENT_CAUTIONS } from '../../text/measurement-cautions';
import { useModel } from '../state/context';
import { useBand } from '../state/band-context';
import { hashFor } from '../shell/router';
import { CalibratePanel } from './CalibratePanel';
import { MeasurementTrend } from './MeasurementTrend';
import { RecordPanel } from './RecordPanel';
import { SpectrumPlot, type PredictedLine } from './SpectrumPlot';
import { keepRecord } from './record-store';
import { MeasurementFields, type MeasurementMeta, nowForInput } from './MeasurementFields';

const fmt = (x: number) => String(Number(x.toPrecision(4)));

export function MeasureScreen() {
  const [state, model] = useModel();
  const doc = state.doc;
  const [analysis, setAnalysis] = useState<SpectrumAnalysis | null>(null);
  const [record, setRecord] = useState<MotionRecord | null>(null);
  const [keepMessage, setKeepMessage] = useState<string | null>(null);
  const [analysisError, setAnalysisError] = useState<string | null>(null);
  const [picked, setPicked] = useState<number | null>(null);
  const [meta, setMeta] = useState<MeasurementMeta>({ takenAt: nowForInput(), by: '', elevation: '', waterLevel: '', note: '', typedHz: '', typedUncertaintyHz: '', mode: '1', state: 'wet' });
  const [calibrated, setCalibrated] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const [bandState] = useBand();
  if (!doc) {
    return (
      <section class="screen" aria-labelledby="screen-title">
        <h1 id="screen-title" tabIndex={-1}>Field check</h1>
        <p class="notice">No case is open. Open one from <a href={hashFor('cases')}>Cases</a>.</p>
      </section>
    );
  }
  const answer = state.results?.answer;
  const member = answer && answer.ok && answer.engine !== 'plate' ? answer.member : null;
  // The first two modes, dry and wet, with their bands where ranges are on and the band is of this case.
  const band = bandState.status === 'done' && bandState.answer?.ok && bandState.answer.band ? bandState.answer.band : null;
  const bandOf = (st: 'dry' | 'wet', j: number): [number, number] | undefined => {
    const m = band?.[st]?.modes[j];
    return m ? [m.lowHz, m.highHz] : undefined;
  };
  const predicted: PredictedLine[] = member
    ? [
        ...member.dry.frequenciesHz.slice(0, 2).map((f, i) => ({ frequencyHz: f, state: 'dry' as const, mode: i + 1, band: bandOf('dry', i) })),
        ...(member.wet?.frequenciesHz.slice(0, 2).map((f, i) => ({ frequencyHz: f, state: 'wet' as const, mode: i + 1, band: bandOf('wet', i) })) ?? []),
      ]
    : [];

  const onRecord = (record: MotionRecord) => {
    setRecord(record);
    // Ask for bins fine enough to place the lowest predicted frequency (about ten bins below it); the core gives
    // the finest the record allows and says so when the record is too short for it.
    const lowest = predicted.length > 0 ? Math.min(...predicted.map((p) => p.frequencyHz)) : null;
    const a = analyseMotionRecord(record, lowest ? { resolutionHz: Number((lowest / 10).toPrecision(2)) } : {});
    setPicked(null);
    setSaved(false);
    if (!a.ok) {
      setAnalysis(null);
      setAnalysisError(a.message);
    } else {
      setAnalysis(a);
      setAnalysisError(null);
      if (a.peaks.length > 0) setPicked(0);
    }
  };
  const peak = analysis && picked !== null ? analysis.peaks[picked] : null;
  // A picked peak is known to about half a bin of the spectrum; a typed value carries the uncertainty typed with it.
  const measuredHz = peak ? peak.frequencyHz : Number(meta.typedHz.replace(',', '.'));
  const uncertaintyHz = peak ? analysis!.resolutionHz / 2 : Number(meta.typedUncertaintyHz.replace(',', '.') || '0');
  const mode = Number(meta.mode);
  const usable = measuredHz > 0 && Number.isFinite(measuredHz) && uncertaintyHz >= 0 && uncertaintyHz < measuredHz && Number.isInteger(mode) && mode >= 1 && mode <= 20;
  const when = new Date(meta.takenAt);
  const takenAt = Number.isFinite(when.getTime()) ? when.toISOString() : new Date().toISOString();
  const measured = { frequencyHz: measuredHz, uncertaintyHz, mode, state: meta.state, takenAt };

  const save = () => {
    const m: CaseMeasurement = {
      id: crypto.randomUUID(),
      takenAt,
      by: meta.by,
      elevation: meta.elevation,
      waterLevel: meta.waterLevel,
      frequencyHz: measuredHz,
      uncertaintyHz,
      mode,
      state: meta.state,
      source: peak ? 'record' : 'typed',
      note: meta.note,
    };
    model.edit((d) => ({ ...d, measurements: [...(d.measurements ?? []), m] }));
    setSaved(true);
    setKeepMessage(null);
    // The record itself stays on this device, in its own store; the case keeps the frequency read from it.
    if (peak && record) void keepRecord(m.id, record).then((r) => setKeepMessage(r.ok ? null : r.message));
  };
  const figures = answer && answer.ok ? answerFigures(answer) : null;

  return (
    <section class="screen measure-screen" aria-labelledby="screen-title">
      <h1 id="screen-title" tabIndex={-1}>Field check: {doc.name || kindOf(doc.kind).title}</h1>
      <ul class="cautions measure-cautions" data-testid="measure-cautions">
        {MEASUREMENT_CAUTIONS.map((c) => (
          <li key={c.title}><strong>{c.title}.</strong> {c.text}</li>
        ))}
      </ul>
      <RecordPanel onRecord={onRecord} />
      {analysisError && <p class="field-error" role="alert">{analysisError}</p>}
      {analysis && (
        <div class="panel" data-testid="spectrum-panel">
          <h2>Spectrum</h2>
          <p class="field-help">
            {fmt(analysis.durationS)} s at {fmt(analysis.sampleRateHz)} Hz; resolution {fmt(analysis.resolutionHz)} Hz; frequencies up to {fmt(analysis.nyquistHz)} Hz.
            Predicted lines: dry dashed, wet solid. Tap a peak, or choose it below, to say which it is.
          </p>
          <SpectrumPlot analysis={analysis} predicted={predicted} pickedHz={peak?.frequencyHz ?? null} onPick={setPicked} />
          <label class="field">
            <span>Peak</span>
            <select value={picked ?? ''} onChange={(e) => setPicked(Number((e.currentTarget as HTMLSelectElement).value))} data-testid="peak-select">
              {analysis.peaks.map((p, i) => (
                <option key={i} value={i}>
                  {p.frequencyHz.toFixed(3)} Hz{p.dampingRatio !== null && p.dampingRatio !== undefined ? `, damping ${(100 * p.dampingRatio).toFixed(1)} %` : ''}
                </option>
              ))}
            </select>
          </label>
          {analysis.notes.map((n) => <p class="field-help" key={n}>{n}</p>)}
        </div>
      )}
      <MeasurementFields meta={meta} fromRecord={peak !== null} onChange={(m) => { setMeta(m); setSaved(false); }} />
      {usable && (
        <div class="panel" data-testid="measured-summary">
          <p>
            Measured <strong data-testid="measured-frequency">{measuredHz.toFixed(3)} Hz</strong> ± {fmt(uncertaintyHz)} Hz, taken as {meta.state} mode {mode}
            {member && (meta.state === 'dry' ? member.dry : member.wet)?.frequenciesHz[mode - 1] !== undefined
              ? `; predicted ${fmt((meta.state === 'dry' ? member.dry : member.wet)!.frequenciesHz[mode - 1])} Hz`
              : ''}
            .
          </p>
          <button type="button" class="btn" onClick={save} disabled={saved} data-testid="measurement-save">{saved ? 'Kept with the case' : 'Keep this measurement with the case'}</button>
          <p class="field-help">A shared link and the case file carry the measured frequency and the notes, not the motion record: the record is kept on this device only.</p>
          {keepMessage && <p class="field-error" role="alert">{keepMessage}</p>}
        </div>
      )}
      {usable && member && (
        <CalibratePanel
          doc={doc}
          measured={measured}
          onUse={(c, label, unit) => {
            model.edit((d) => ({ ...d, inputs: c.inputs }));
            setCalibrated(`${label} = ${fmt(Number(c.inputs[c.key]))} ${unit}, calibrated to the measurement of ${takenAt.slice(0, 16).replace('T', ' ')}`);
          }}
        />
      )}
      {calibrated && (
        <div class="panel" data-testid="calibrated-result">
          <p><strong>{calibrated}.</strong></p>
          {state.computing || !figures ? (
            <p class="status">Working out the results again…</p>
          ) : (
            <p>
              Lowest dry {fmt(figures.lowestDryHz)} Hz{figures.lowestWetHz !== null ? `, lowest wet ${fmt(figures.lowestWetHz)} Hz` : ''}; verdict{' '}
              <strong data-testid="calibrated-verdict">{figures.verdict ?? 'not screened'}</strong>. <a href={hashFor('results')}>See the results</a>
            </p>
          )}
        </div>
      )}
      <MeasurementTrend measurements={doc.measurements ?? []} />
    </section>
  );
}
