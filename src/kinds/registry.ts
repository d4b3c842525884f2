/**
 * The member-kind registry: one line per kind. Every other kind list in the app (the case schema's ids, the
 * forms, the new-case panel, the demos, the Cases search, the results wording, the command line) is derived
 * from `KINDS`; the ids themselves are listed once in registry-pure.ts, and the `Record` below makes a kind
 * without a module, or a module without an id, a compile error.
 */
import type { DemoCase, MemberForm } from '../forms/types';
import { BAFFLE } from './baffle';
import type { BaffleInput } from './baffle/build';
import type { KindBuild, MemberBuild, PlateBuild } from './common/types';
import type { KindModule } from './kind-module';
import { PILE } from './pile';
import { PLATE } from './plate-panel';
import type { PlateInput } from './plate-panel/build';
import type { PileInput } from './pile/build';
import { KIND_IDS, type KindId } from './registry-pure';
import { RISER } from './riser';
import type { RiserInput } from './riser/build';
import { STEM } from './stem';
import type { StemInput } from './stem/build';

export { KIND_IDS, type KindId };
export type { KindModule };

/** The SI input of each member kind. */
export interface MemberInputs {
  pile: PileInput;
  riser: RiserInput;
  baffle: BaffleInput;
  stem: StemInput;
  'plate-panel': PlateInput;
}

/** What each kind builds: a beam member model, or a plate for the plate engine. */
export interface MemberBuilds {
  pile: MemberBuild;
  riser: MemberBuild;
  baffle: MemberBuild;
  stem: MemberBuild;
  'plate-panel': PlateBuild;
}

/** Every kind's module, by id. */
export const KINDS: { readonly [K in KindId]: KindModule<MemberInputs[K], MemberBuilds[K]> } = {
  pile: PILE,
  riser: RISER,
  baffle: BAFFLE,
  stem: STEM,
  'plate-panel': PLATE,
};

/** The kind module of an id, typed for any kind (use `KINDS[id]` when the id is a literal). */
export function kindOf(kind: KindId): KindModule<unknown, KindBuild> {
  return KINDS[kind] as KindModule<unknown, KindBuild>;
}

/** The forms of every kind, by id. */
export const FORMS = Object.fromEntries(KIND_IDS.map((k) => [k, KINDS[k].form])) as { readonly [K in KindId]: MemberForm<MemberInputs[K], MemberBuilds[K]> };

/** The worked examples, one per kind, in registry order. */
export const DEMO_CASES: readonly DemoCase[] = KIND_IDS.map((k) => KINDS[k].demo);

/** Builds any kind of member from its SI input; throws RangeError for invalid input or an unknown kind. */
export function buildMember<K extends KindId>(kind: K, input: MemberInputs[K]): MemberBuilds[K] {
  const module = (KIND_IDS as readonly string[]).includes(kind) ? (KINDS[kind] as KindModule<MemberInputs[K], MemberBuilds[K]>) : undefined;
  if (!module) throw new RangeError(`kind must be one of ${KIND_IDS.map((k) => `"${k}"`).join(', ')}, got ${JSON.stringify(kind)}`);
  return module.build(input);
}
