/**
 * Dry and wet modes of a plate panel: the public entry after `parsePlateInput`. Dry modes by Rayleigh–Ritz
 * (dry.ts); wet modes by an added-mass matrix on the dry modes (wet.ts) from the Rayleigh integral for a
 * panel in a rigid wall (rayleigh.ts) or an eigenfunction series for a plate across a tank (tank.ts). Every
 * answer is computed twice, at the default and at a coarser resolution, for the error estimate.
 */
import { clearDryMemo, dryModes, modeValuesOnGrid } from './dry';
import type { DryModes } from './dry';
import { IMAGE_NOTE, rayleighAddedMass } from './rayleigh';
import { sloshingModes } from './sloshing';
import { tankAddedMass } from './tank';
import { combineVectors, dominantDryMode, wetModes } from './wet';
import { BoundedMemo } from '../memo/bounded-memo';
import { signedPeak } from '../linalg/shape-sign';
import type { PlateInput, PlateOutcome, PlateResolution, PlateResult, SloshingMode } from './types';

const DEFAULTS: Required<PlateResolution> = {
  ritzTerms: 10,
  coupledModes: 16,
  cellsLongSide: 24,
  tankWidthTerms: 16,
  tankDepthTerms: 144,
  gapTerms: 6,
  shapePointsLongSide: 21,
};

const hz = (omega2: number) => Math.sqrt(Math.max(omega2, 0)) / (2 * Math.PI);

function grid(n: number, lengthM: number, midpoints: boolean): Float64Array {
  const x = new Float64Array(n);
  for (let i = 0; i < n; i++) x[i] = midpoints ? ((i + 0.5) * lengthM) / n : (i * lengthM) / (n - 1);
  return x;
}

/** Cells (or points) along width and height, `long` along the longer side. */
function split(p: PlateInput, long: number, min: number): [number, number] {
  const r = p.widthM / p.heightM;
  return r >= 1 ? [long, Math.max(min, Math.round(long / r))] : [Math.max(min, Math.round(long * r)), long];
}

type AddedMass = { ok: true; ma: Float64Array } | { ok: false; message: string };

/**
 * Added mass per unit liquid density (M_a is linear in ρ), keyed by the dry shapes it is taken on and the liquid's
 * geometry: a keystroke on a density, the thickness or the material reuses it.
 */
const unitAddedMass = new BoundedMemo<Float64Array>(8);

/** Forgets every memoised piece, so the next solve is a first solve (benchmarks; tests of the memo). */
export function clearPlateMemos(): void {
  clearDryMemo();
  unitAddedMass.clear();
}

function addedMass(p: PlateInput, dry: DryModes, count: number, res: Required<PlateResolution>): AddedMass {
  const liq = p.liquid!;
  const key = [dry.shapeKey, count, liq.setting, liq.sides, liq.depthM, liq.reachM, res.cellsLongSide, res.tankWidthTerms, res.tankDepthTerms, res.gapTerms].join('|');
  const unit = unitAddedMass.get(key, () => {
    if (liq.setting === 'wall-panel') {
      const [gx, gy] = split(p, res.cellsLongSide, 4);
      const shapes = modeValuesOnGrid(dry, dry.vectors, count, grid(gx, p.widthM, true), grid(gy, p.heightM, true));
      const ma = rayleighAddedMass(shapes, gx, gy, p.widthM / gx, p.heightM / gy, 1, liq.reachM);
      if (liq.sides === 2) for (let i = 0; i < ma.length; i++) ma[i] *= 2;
      return ma;
    }
    const reach = liq.reachM ?? Infinity;
    const tank = { widthM: p.widthM, heightM: p.heightM, depthM: liq.depthM!, reachesM: liq.sides === 2 ? [reach, reach] : [reach] };
    return tankAddedMass(dry.bx, dry.by, dry.vectors, count, tank, { widthTerms: res.tankWidthTerms, depthTerms: res.tankDepthTerms, gapTerms: res.gapTerms }, 1);
  });
  if (!unit) return { ok: false, message: 'the flow over the top edge could not be resolved (gap system singular)' };
  const ma = new Float64Array(unit.length);
  for (let i = 0; i < ma.length; i++) ma[i] = liq.densityKgPerM3 * unit[i];
  return { ok: true, ma };
}

function coarser(res: Required<PlateResolution>): Required<PlateResolution> {
  return {
    ...res,
    ritzTerms: Math.max(6, res.ritzTerms - 4),
    coupledModes: Math.max(6, Math.round((res.coupledModes * 2) / 3)),
    cellsLongSide: Math.max(8, Math.round(res.cellsLongSide / 2)),
    tankWidthTerms: Math.max(4, Math.round(res.tankWidthTerms / 2)),
    tankDepthTerms: Math.max(8, Math.round(res.tankDepthTerms / 2)),
    gapTerms: Math.max(3, Math.round(res.gapTerms / 2)),
  };
}

type Frequencies = { ok: true; dry: DryModes; dryHz: number[]; wetHz: number[] | null; wetQ: Float64Array | null; count: number } | { ok: false; reason: 'basis-ill-conditioned' | 'not-converged' | 'added-mass-not-positive'; message: string };

function frequencies(p: PlateInput, modes: number, res: Required<PlateResolution>): Frequencies {
  const d = dryModes(p, res.ritzTerms);
  if (!d.ok) return d;
  const dry = d.modes;
  const dryHz = Array.from(dry.omega2.subarray(0, modes), hz);
  if (!p.liquid) return { ok: true, dry, dryHz, wetHz: null, wetQ: null, count: 0 };
  const count = Math.min(dry.n, Math.max(res.coupledModes, modes + 6));
  const ma = addedMass(p, dry, count, res);
  if (!ma.ok) return { ok: false, reason: 'not-converged', message: ma.message };
  const w = wetModes(dry.omega2, count, p.densityKgPerM3 * p.thicknessM, ma.ma);
  if (!w.ok) return w;
  return { ok: true, dry, dryHz, wetHz: Array.from(w.omega2.subarray(0, modes), hz), wetQ: w.q, count };
}

const relative = (fine: number[], coarse: number[]) => fine.map((f, i) => Math.abs(f - coarse[i]) / f);

/** Each shape scaled to a largest |value| of 1, its first peak positive (`signedPeak`: ties within 1e-6 go to the lower index). */
export function normalised(shapes: Float64Array[]): Float64Array[] {
  return shapes.map((s) => {
    const peak = signedPeak(s);
    const f = peak !== 0 ? 1 / peak : 1;
    return s.map((v) => v * f);
  });
}

/** Dry and wet modes of a validated plate (see `parsePlateInput`). */
export function solvePlate(p: PlateInput, resolution: PlateResolution = {}): PlateOutcome {
  const res: Required<PlateResolution> = { ...DEFAULTS, ...resolution };
  const modes = Math.min(p.modes ?? 6, res.ritzTerms ** 2);
  const fine = frequencies(p, modes, res);
  if (!fine.ok) return fine;
  const coarse = frequencies(p, modes, coarser(res));
  if (!coarse.ok) return coarse;
  const [sx, sy] = split(p, res.shapePointsLongSide, 5);
  const xs = grid(sx, p.widthM, false);
  const ys = grid(sy, p.heightM, false);
  const dry = fine.dry;
  const result: PlateResult = {
    dry: { frequenciesHz: fine.dryHz, shapes: normalised(modeValuesOnGrid(dry, dry.vectors, modes, xs, ys)) },
    wet: null,
    grid: { nx: sx, ny: sy },
    wetToDryRatio: [],
    method: [
      `Dry modes: Rayleigh–Ritz, Kirchhoff plate, ${res.ritzTerms} × ${res.ritzTerms} orthonormalised Legendre polynomials times edge factors (A.W. Leissa, Vibration of Plates, NASA SP-160, 1969).`,
    ],
    validity: ['Thin plate (Kirchhoff): thickness well below the shorter side; small deflections; isotropic, uniform plate; ideal edges.'],
    errorEstimate: {
      basis: `difference from a coarser solve (${coarser(res).ritzTerms} Ritz terms per direction${p.liquid ? ', liquid resolution halved, two thirds of the coupled modes' : ''})`,
      dryRelative: relative(fine.dryHz, coarse.dryHz),
      wetRelative: fine.wetHz && coarse.wetHz ? relative(fine.wetHz, coarse.wetHz) : [],
    },
    sloshing: null,
    notes: [],
  };
  if (p.thicknessM > Math.min(p.widthM, p.heightM) / 20) {
    result.notes.push('The plate is thick for its span (thickness above a twentieth of the shorter side): shear deformation and rotary inertia, left out here, lower the higher frequencies.');
  }
  if (p.liquid && fine.wetHz && fine.wetQ) {
    const liq = p.liquid;
    const wetVectors = combineVectors(dry.vectors, dry.n, fine.wetQ, fine.count, modes);
    result.wet = { frequenciesHz: fine.wetHz, shapes: normalised(modeValuesOnGrid(dry, wetVectors, modes, xs, ys)) };
    result.wetToDryRatio = dominantDryMode(fine.wetQ, fine.count, modes).map((k, r) => fine.wetHz![r] / hz(dry.omega2[k]));
    result.method.push(`Wet modes: liquid kinetic energy as an added-mass matrix on the lowest ${fine.count} dry modes, coupled eigenproblem (wet modes mix dry ones).`);
    result.validity.push('Liquid incompressible and inviscid, at rest (no current), small motions; no free-surface waves (frequencies well above sloshing).');
    if (liq.setting === 'wall-panel') {
      const [gx, gy] = split(p, res.cellsLongSide, 4);
      result.method.push(
        `Wall panel: Rayleigh integral for a panel in an infinite rigid plane wall, liquid on ${liq.sides === 2 ? 'both faces (twice one face)' : 'one face'}; ${gx} × ${gy} cells, exact 1/r integral over near cells.`,
      );
      if (liq.reachM !== undefined) result.method.push(`Facing rigid wall ${liq.reachM} m away on each wetted side. ${IMAGE_NOTE}`);
      result.validity.push('The wall around the panel is rigid and continues well beyond every edge; no free surface near the panel.');
    } else {
      result.method.push(
        `Across tank: eigenfunction series cos(mπs/a)·cos((2n−1)πz/2d) in each compartment (${res.tankWidthTerms} × ${res.tankDepthTerms} terms), rigid side walls, floor and end walls, free surface at potential zero` +
          (liq.depthM! > p.heightM ? `; flow over the top edge by Galerkin matching in the gap with ${res.gapTerms} edge-singular functions.` : '; the plate covers the whole wetted section.'),
      );
      result.validity.push('Tank width equals the plate width (side edges on the side walls), bottom edge on the floor, walls rigid.');
      result.sloshing = tankSloshing(p);
      const highest = Math.max(...result.sloshing.map((m) => m.frequencyHz));
      if (fine.wetHz[0] < 3 * highest) {
        result.notes.push(`The lowest wet frequency is less than three times the sloshing frequencies listed (up to ${highest.toPrecision(3)} Hz): the free surface is no longer a pressure-release surface there; treat the wet frequencies as rough.`);
      }
    }
  }
  return { ok: true, result };
}

function tankSloshing(p: PlateInput): SloshingMode[] {
  const liq = p.liquid!;
  const d = liq.depthM!;
  const spans = [{ lengthM: p.widthM, what: 'across the tank width' }];
  if (liq.reachM !== undefined) {
    spans.push(
      d > p.heightM
        ? { lengthM: 2 * liq.reachM, what: 'along the tank over the submerged plate (plate ignored)' }
        : { lengthM: liq.reachM, what: 'along the compartment between plate and end wall' },
    );
  }
  return sloshingModes(spans, d, 3);
}
