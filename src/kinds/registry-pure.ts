/**
 * The member-kind ids, listed once. Pure (no imports), so the case schema and the pure kind builders can use it
 * under the ES2022-only typecheck. `registry.ts` maps every id to its kind module with a
 * `Record<KindId, KindModule>`, so an id added here without a module (or the reverse) does not compile.
 */
export const KIND_IDS = ['pile', 'riser', 'baffle', 'stem', 'plate-panel'] as const;

/** Member kind: pile, riser (or conductor), tank baffle, sensor stem, plate panel. */
export type KindId = (typeof KIND_IDS)[number];
