import { describe, it, expect, vi } from 'vitest';
import { SolverClient, type WorkerLike } from '../../src/worker/solver-client';

/** A fake worker that records messages and answers only when told to. */
class FakeWorker implements WorkerLike {
  onmessage: ((e: { data: unknown }) => void) | null = null;
  onerror: ((e: { message?: string }) => void) | null = null;
  sent: { id: number; request: number }[] = [];
  terminated = false;
  postMessage(m: unknown) { this.sent.push(m as { id: number; request: number }); }
  terminate() { this.terminated = true; }
  answer(i: number, value: number) { this.onmessage?.({ data: { id: this.sent[i].id, value } }); }
}

function setup(timeoutMs = 1000) {
  const workers: FakeWorker[] = [];
  const client = new SolverClient<number, number>(() => {
    const w = new FakeWorker();
    workers.push(w);
    return w;
  }, timeoutMs);
  return { client, workers };
}

describe('solver client', () => {
  it('answers a single request with the worker reply', async () => {
    const { client, workers } = setup();
    const p = client.request(7);
    workers[0].answer(0, 49);
    expect(await p).toEqual({ status: 'done', value: 49 });
  });

  it('a solve started ahead (prefetch) answers the same request later without a second solve', async () => {
    const { client, workers } = setup();
    client.prefetch(7);
    workers[0].answer(0, 49); // answered before the page asks
    expect(await client.request(7)).toEqual({ status: 'done', value: 49 });
    expect(workers[0].sent.map((m) => m.request)).toEqual([7]);
  });

  it('a different request after a prefetch is solved for itself, and the guess is used once only', async () => {
    const { client, workers } = setup();
    client.prefetch(7);
    const other = client.request(8);
    workers[0].answer(0, 49);
    workers[0].answer(1, 64);
    expect(await other).toEqual({ status: 'done', value: 64 });
    const again = client.request(7);
    expect(workers[0].sent.map((m) => m.request)).toEqual([7, 8, 7]);
    workers[0].answer(2, 49);
    expect(await again).toEqual({ status: 'done', value: 49 });
  });

  it('keeps only the newest waiting request while one runs: older waiting ones are superseded', async () => {
    const { client, workers } = setup();
    const a = client.request(1);
    const b = client.request(2);
    const c = client.request(3);
    expect(await b).toEqual({ status: 'superseded' });
    workers[0].answer(0, 10);
    expect(await a).toEqual({ status: 'done', value: 10 });
    expect(workers[0].sent.map((m) => m.request)).toEqual([1, 3]);
    workers[0].answer(1, 30);
    expect(await c).toEqual({ status: 'done', value: 30 });
  });

  it('a solve that runs too long is cut off, its worker replaced, and the next request still runs', async () => {
    vi.useFakeTimers();
    const { client, workers } = setup(500);
    const a = client.request(1);
    const b = client.request(2);
    vi.advanceTimersByTime(501);
    expect(await a).toEqual({ status: 'timeout', afterMs: 500 });
    expect(workers[0].terminated).toBe(true);
    expect(workers[1].sent.map((m) => m.request)).toEqual([2]);
    workers[1].answer(0, 20);
    expect(await b).toEqual({ status: 'done', value: 20 });
    vi.useRealTimers();
  });

  it('a crash in the worker resolves the running request as crashed with its message', async () => {
    const { client, workers } = setup();
    const a = client.request(1);
    workers[0].onerror?.({ message: 'out of memory' });
    expect(await a).toEqual({ status: 'crashed', message: 'out of memory' });
  });

  it('terminate stops the worker and resolves everything outstanding as superseded', async () => {
    const { client, workers } = setup();
    const a = client.request(1);
    const b = client.request(2);
    client.terminate();
    expect(await a).toEqual({ status: 'superseded' });
    expect(await b).toEqual({ status: 'superseded' });
    expect(workers[0].terminated).toBe(true);
  });
});
