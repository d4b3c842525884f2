/**
 * With WETMODE_EIGEN_DUMP=<folder>, the member bench writes its 200- and 1,000-element problems (K, M in the
 * banded layout of src/physics/linalg/banded.ts) and Wetmode's lowest eigenvalues there as JSON, so
 * `test/tools/eigen-vs-scipy.py` can time SciPy's routes on the very same matrices. Off by default.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { SymBanded } from '../../src/physics/linalg/banded';
import type { LowestModesOutcome } from '../../src/physics/linalg/eigen-lanczos';

export function dumpEigenProblem(name: string, k: SymBanded, m: SymBanded, ours: LowestModesOutcome): void {
  const dir = process.env.WETMODE_EIGEN_DUMP;
  if (!dir || !ours.ok) return;
  mkdirSync(dir, { recursive: true });
  const file = join(dir, `${name}.json`);
  writeFileSync(file, JSON.stringify({ n: k.n, halfBandwidth: k.halfBandwidth, k: Array.from(k.data), m: Array.from(m.data), wetmode: Array.from(ours.values) }));
  console.log(`  wrote ${file}`);
}
