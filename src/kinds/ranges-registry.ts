/**
 * The uncertain inputs each kind offers ranges on (src/kinds/<kind>/ranges.ts). Kept beside the registry rather
 * than in it, so a kind without ranges needs nothing here: `rangesOf` gives it an empty list.
 */
import type { RangeDef } from '../forms/ranges';
import { BAFFLE_RANGES } from './baffle/ranges';
import { PILE_RANGES } from './pile/ranges';
import type { KindId } from './registry-pure';
import { RISER_RANGES } from './riser/ranges';
import { STEM_RANGES } from './stem/ranges';

const RANGES: Partial<Record<KindId, readonly RangeDef[]>> = {
  pile: PILE_RANGES,
  riser: RISER_RANGES,
  baffle: BAFFLE_RANGES,
  stem: STEM_RANGES,
};

export function rangesOf(kind: KindId): readonly RangeDef[] {
  return RANGES[kind] ?? [];
}
