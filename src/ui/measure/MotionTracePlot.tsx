/** The live trace of a recording: the last seconds of each axis, thinned by the recorder (min/max pairs). */
import type { MotionTrace } from '../../physics/signal';

const W = 640;
const H = 120;

export function MotionTracePlot({ trace }: { trace: MotionTrace }) {
  const t = trace.timeS;
  if (t.length < 2) return <p class="field-help">Waiting for the sensor…</p>;
  const t0 = t[0];
  const span = Math.max(t[t.length - 1] - t0, 1e-6);
  // Each axis centred on its mean (gravity sits on one axis); all drawn to one scale, so a quiet axis stays quiet.
  const means = trace.axes.map((a) => {
    let m = 0;
    for (let i = 0; i < a.length; i++) m += a[i] / a.length;
    return m;
  });
  let dev = 1e-9;
  trace.axes.forEach((a, k) => {
    for (let i = 0; i < a.length; i++) dev = Math.max(dev, Math.abs(a[i] - means[k]));
  });
  const paths = trace.axes.map((a, k) => {
    let d = '';
    for (let i = 0; i < a.length; i++) d += `${i === 0 ? 'M' : 'L'}${((W * (t[i] - t0)) / span).toFixed(1)},${(H / 2 - ((H / 2 - 4) * (a[i] - means[k])) / dev).toFixed(1)}`;
    return d;
  });
  return (
    <svg class="motion-trace" viewBox={`0 0 ${W} ${H}`} role="img" aria-label="Live trace of the motion sensor" data-testid="motion-trace">
      {paths.map((d, i) => (
        <path key={i} class={`trace-axis trace-axis-${i}`} d={d} fill="none" />
      ))}
    </svg>
  );
}
