/**
 * The page's band model, one per open-case model, on its own worker (started on first use). Kept out of the
 * app's services so screens that show no band need nothing new.
 */
import { useEffect, useState } from 'preact/hooks';
import type { BandAnswer, BandRequest } from '../../app/band-case';
import { SolverClient, type WorkerLike } from '../../worker/solver-client';
import type { AppModel } from './app-model';
import { BandModel, type BandState } from './band-model';
import { useServices } from './context';

/** A band over six inputs whose modes all need the sampled search takes a few seconds; allow a slow tablet well beyond. */
const BAND_TIMEOUT_MS = 60_000;

const models = new WeakMap<AppModel, BandModel>();

export function bandModelFor(app: AppModel): BandModel {
  let m = models.get(app);
  if (!m) {
    const client = new SolverClient<BandRequest, BandAnswer>(
      () => new Worker(new URL('../../worker/band.worker.ts', import.meta.url), { type: 'module' }) as unknown as WorkerLike,
      BAND_TIMEOUT_MS,
    );
    m = new BandModel(app, client);
    models.set(app, m);
  }
  return m;
}

/** The band model of an open-case model if one was started (the Cases screen reads it without starting a worker). */
export function existingBandModel(app: object): BandModel | undefined {
  return models.get(app as AppModel);
}

/** The band of the open case; re-renders on every change. */
export function useBand(): [BandState, BandModel] {
  const { model } = useServices();
  const band = bandModelFor(model);
  const [state, setState] = useState(band.get());
  useEffect(() => {
    setState(band.get());
    return band.subscribe(() => setState(band.get()));
  }, [band]);
  return [state, band];
}
