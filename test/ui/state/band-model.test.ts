import { describe, expect, it, vi } from 'vitest';
import { caseFromDemo } from '../../../src/app/create-case';
import type { BandAnswer, BandRequest } from '../../../src/app/band-case';
import { DEMO_CASES } from '../../../src/kinds/registry';
import { AppModel } from '../../../src/ui/state/app-model';
import { BandModel } from '../../../src/ui/state/band-model';
import type { Answer } from '../../../src/worker/solver-client';

function fakes() {
  const requests: BandRequest[] = [];
  const resolvers: ((a: Answer<BandAnswer>) => void)[] = [];
  const band = { request: (r: BandRequest) => new Promise<Answer<BandAnswer>>((res) => { requests.push(r); resolvers.push(res); }) };
  const app = new AppModel({ request: () => new Promise(() => undefined) });
  return { requests, resolvers, band, app };
}

describe('the band model', () => {
  it('asks for a band only when a range is on, a short while after the last change, and keeps only the latest', async () => {
    vi.useFakeTimers();
    const f = fakes();
    const m = new BandModel(f.app, f.band, 250);
    f.app.open(caseFromDemo(DEMO_CASES[0]), 'editing', false);
    expect(m.get().status).toBe('none');
    f.app.edit((d) => ({ ...d, ranges: { topMass: { low: '9', high: '15', on: true } } }));
    expect(m.get().status).toBe('working');
    vi.advanceTimersByTime(100);
    f.app.edit((d) => ({ ...d, ranges: { topMass: { low: '10', high: '15', on: true } } }));
    vi.advanceTimersByTime(300);
    expect(f.requests).toHaveLength(1);
    expect(f.requests[0].case.ranges).toEqual({ topMass: { low: '10', high: '15', on: true } });
    f.app.edit((d) => ({ ...d, ranges: { topMass: { low: '11', high: '15', on: true } } }));
    vi.advanceTimersByTime(300);
    // The older answer arrives after a newer request: it is not shown as the band of the case on screen.
    f.resolvers[0]({ status: 'done', value: { ok: true, band: null, ranges: [] } });
    await Promise.resolve();
    expect(m.get().status).toBe('working');
    f.resolvers[1]({ status: 'done', value: { ok: true, band: null, ranges: [] } });
    await Promise.resolve();
    await Promise.resolve();
    expect(m.get().status).toBe('done');
    expect(m.current()).toBe(true);
    f.app.edit((d) => ({ ...d, ranges: { topMass: { low: '11', high: '15', on: false } } }));
    expect(m.get().status).toBe('none');
    vi.useRealTimers();
  });
});
