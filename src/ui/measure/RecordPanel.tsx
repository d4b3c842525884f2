/**
 * Where a motion record comes from: a CSV or text file from a logger, or the tablet's own motion sensor
 * (permission asked from the tap, live trace, the rate achieved, stop after a set time or on a tap).
 */
import { useEffect, useRef, useState } from 'preact/hooks';
import { MotionRecorder, parseMotionRecord, type MotionRecord, type MotionTrace } from '../../physics/signal';
import { requestMotionPermission, startMotionSensor, type MotionHost } from './motion-sensor';
import { MotionTracePlot } from './MotionTracePlot';

export function RecordPanel({ onRecord }: { onRecord: (record: MotionRecord, what: string) => void }) {
  const [seconds, setSeconds] = useState('20');
  const [message, setMessage] = useState<string | null>(null);
  const [recording, setRecording] = useState(false);
  const [trace, setTrace] = useState<MotionTrace | null>(null);
  const [rate, setRate] = useState<number | null>(null);
  const stopRef = useRef<(() => void) | null>(null);
  useEffect(() => () => stopRef.current?.(), []);

  const readFile = async (file: File) => {
    setMessage(null);
    const r = parseMotionRecord(await file.text());
    if (!r.ok) setMessage(`${file.name} does not read: ${r.message}`);
    else onRecord(r.record, `file ${file.name}`);
  };

  const start = async () => {
    setMessage(null);
    const host = window as unknown as MotionHost;
    const allowed = await requestMotionPermission(host);
    if (!allowed.ok) return setMessage(allowed.message);
    const s = Number(seconds);
    if (!(s > 0 && s <= 600)) return setMessage('the recording time must be a number of seconds from 1 to 600');
    const recorder = new MotionRecorder(s);
    let last = 0;
    setRecording(true);
    setTrace(null);
    const handle = startMotionSensor(host, recorder, {
      onSample: () => {
        const now = performance.now();
        if (now - last < 100) return; // redraw at most ten times a second
        last = now;
        setTrace(recorder.trace(400, 10));
        setRate(recorder.achievedRateHz);
      },
      onStop: (why) => {
        stopRef.current = null;
        setRecording(false);
        setRate(recorder.achievedRateHz);
        setTrace(recorder.trace(400, 10));
        if (why === 'no-data') return setMessage('no motion data came from the sensor: this device or browser may have none; import a file from a logger instead');
        const r = recorder.toRecord();
        if (!r.ok) setMessage(`the recording cannot be analysed: ${r.message}`);
        else onRecord(r.record, 'the tablet motion sensor');
      },
    });
    stopRef.current = handle.stop;
  };

  return (
    <div class="panel" data-testid="record-panel">
      <h2>Motion record</h2>
      <div class="field-grid">
        <label class="field field-wide">
          <span>Import a logger file (CSV or text: time in s, then 1 to 3 accelerations)</span>
          <input type="file" accept=".csv,.txt,.tsv,.dat,text/*" data-testid="record-file" onChange={(e) => {
            const f = (e.currentTarget as HTMLInputElement).files?.[0];
            if (f) void readFile(f);
          }} />
        </label>
        <label class="field">
          <span>Record for, s</span>
          <input type="text" inputMode="decimal" value={seconds} disabled={recording} onInput={(e) => setSeconds((e.currentTarget as HTMLInputElement).value)} data-testid="record-seconds" />
        </label>
      </div>
      <div class="toolbar">
        {recording ? (
          <button type="button" class="btn" onClick={() => stopRef.current?.()} data-testid="record-stop">Stop recording</button>
        ) : (
          <button type="button" class="btn" onClick={() => void start()} data-testid="record-start">Record with this tablet</button>
        )}
        {rate !== null && (
          <span class="status" data-testid="record-rate">
            Sample rate achieved: {rate.toFixed(1)} Hz, so nothing above {(rate / 2).toFixed(1)} Hz can be seen
          </span>
        )}
      </div>
      <p class="field-help">
        The sensor's rate (often about 60 Hz) limits the highest frequency it can see to half the rate. A tablet held by hand records the hand too: press it
        firmly against the member.
      </p>
      {(recording || trace) && trace && <MotionTracePlot trace={trace} />}
      {message && <p class="field-error" role="alert">{message}</p>}
    </div>
  );
}
