/**
 * The Krylov basis of a Lanczos run (src/physics/linalg/eigen-lanczos.ts) and the spare bases kept between
 * solves, so a refinement's ten or so solves per keystroke reuse two sets of large arrays instead of making
 * new ones.
 */

/**
 * Basis arrays kept from finished solves (the solver runs on one thread and never re-enters): two, as a
 * refinement holds a mesh's dry and wet solves until it knows whether that mesh is its last.
 */
const spareBases: { q: Float64Array; mq: Float64Array }[] = [];
const SPARE_COUNT = 2;
/** Largest basis kept between solves (floats per array): 32 MB for a pair of arrays. */
const SPARE_LIMIT = 1 << 21;

export function recycleBasis(ws: Workspace): void {
  if (ws.q.length > SPARE_LIMIT || spareBases.some((b) => b.q === ws.q)) return;
  if (spareBases.length < SPARE_COUNT) {
    spareBases.push({ q: ws.q, mq: ws.mq });
    return;
  }
  // Full: the new basis replaces the smallest kept one if it is larger.
  let smallest = 0;
  for (let i = 1; i < spareBases.length; i++) if (spareBases[i].q.length < spareBases[smallest].q.length) smallest = i;
  if (spareBases[smallest].q.length < ws.q.length) spareBases[smallest] = { q: ws.q, mq: ws.mq };
}

/** The smallest kept basis with room for `floats` per array, taken out of the pool; null if none fits. */
function takeSpareBasis(floats: number): { q: Float64Array; mq: Float64Array } | null {
  let best = -1;
  for (let i = 0; i < spareBases.length; i++) {
    if (spareBases[i].q.length >= floats && (best < 0 || spareBases[i].q.length < spareBases[best].q.length)) best = i;
  }
  return best < 0 ? null : spareBases.splice(best, 1)[0];
}

/**
 * Krylov basis and its M-images, one flat Float64Array each: vector j at `[j·n … (j+1)·n)`; the
 * tridiagonal's α_j and β_j (β_j couples vectors j − 1 and j; 0 at a block start) and the ω estimates
 * of |q_jᵀ M q_k| for the current and previous vectors. Grown by doubling, never per step.
 */
export class Workspace {
  q: Float64Array;
  mq: Float64Array;
  alpha: Float64Array;
  beta: Float64Array;
  omPrev: Float64Array;
  omCur: Float64Array;
  omNext: Float64Array;
  cap: number;
  constructor(
    readonly n: number,
    cap: number,
  ) {
    this.cap = cap;
    // The basis arrays are the large ones: taken from an earlier solve's when they fit (a refinement's
    // dry and wet solves, and the next mesh, which has about twice the DOFs), else made with room for that.
    // Stale entries are harmless: vector j is written before anything reads it.
    const spare = takeSpareBasis(cap * n);
    if (spare) {
      this.q = spare.q;
      this.mq = spare.mq;
    } else {
      this.q = new Float64Array(2 * cap * n);
      this.mq = new Float64Array(2 * cap * n);
    }
    this.alpha = new Float64Array(cap);
    this.beta = new Float64Array(cap + 1);
    this.omPrev = new Float64Array(cap + 1);
    this.omCur = new Float64Array(cap + 1);
    this.omNext = new Float64Array(cap + 1);
  }
  grow(limit: number): void {
    const cap = Math.min(limit, 2 * this.cap);
    const n = this.n;
    const more = (a: Float64Array, len: number) => {
      const b = new Float64Array(len);
      b.set(a.subarray(0, Math.min(a.length, len)));
      return b;
    };
    this.q = more(this.q, cap * n);
    this.mq = more(this.mq, cap * n);
    this.alpha = more(this.alpha, cap);
    this.beta = more(this.beta, cap + 1);
    this.omPrev = more(this.omPrev, cap + 1);
    this.omCur = more(this.omCur, cap + 1);
    this.omNext = more(this.omNext, cap + 1);
    this.cap = cap;
  }
}
