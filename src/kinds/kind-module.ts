/**
 * What one member kind supplies, in one folder (src/kinds/<kind>/): the pure part (SI input checks and the
 * model builder, in build.ts), the guided form with defaults and their sources, the resonance inputs it
 * offers, its wording and its worked example. `registry.ts` lists every kind in a `Record<KindId, KindModule>`.
 *
 * `engine` names what solves the kind's build. Every kind today builds a beam member model (MemberBuild) and is
 * solved by the beam engine; a kind that is not a beam (a plate panel) adds its own engine name here, and the
 * application service (src/app/solve-case.ts) gains the matching branch of its exhaustive switch.
 */
import type { ResonanceSpec } from '../forms/excitation';
import type { DemoCase, MemberForm } from '../forms/types';
import type { KindBuild, MemberBuild } from './common/types';
import type { KindId } from './registry-pure';

/** The engines that solve a kind's build. */
export type KindEngine = 'beam' | 'plate';

/** `B` is what the kind builds: a beam member model (MemberBuild) or a plate (PlateBuild). */
export interface KindModule<I = unknown, B extends KindBuild = MemberBuild> {
  id: KindId;
  engine: KindEngine;
  /** "Pile", "Riser or conductor", … (the form's title). */
  title: string;
  /** One sentence saying what the member is and how it is held (the form's summary). */
  summary: string;
  /** Words the Cases search matches for this kind, beyond the case's own text ("riser conductor"). */
  searchWords: string;
  /** What the flow past the member is called, in the surveyor's words ("current", "flow speed"). */
  flowWord: string;
  /** Checks the SI input once (throws RangeError naming the field); pure. */
  validate(input: I): I;
  /** The member model and schematic data from the SI input; pure. Throws RangeError for invalid input. */
  build(input: I): B;
  /** The guided form: fields, defaults with their sources, cross-field checks, mapping to the SI input. */
  form: MemberForm<I, B>;
  /** The resonance inputs the kind offers and how its flow is read. */
  resonance: ResonanceSpec;
  /** The worked example, in an invented setting. */
  demo: DemoCase;
}
