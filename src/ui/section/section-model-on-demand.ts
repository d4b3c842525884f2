/**
 * The page's one Section model, created on first use: its code (the section form reader, presets, the solver's
 * input checks) is part of the Section screen's chunk, not of the app's first load. A member handed over before
 * the model exists (the "Section and flow" link) is opened in it as soon as it is made, before the screen shows.
 */
import type { MemberModel } from '../../physics/beam/model';
import type { SectionModel } from './section-model';
import type { SectionSolver } from './section-solves';

export interface SectionModelOnDemand {
  /** The model once made (null before its first use). */
  current(): SectionModel | null;
  /** Makes the model on first call (fetching its code); later calls return the same one. A failed fetch may be retried. */
  get(): Promise<SectionModel>;
  /** Opens the member's submerged section in the model (made first if need be). */
  openMember(member: MemberModel): void;
}

export function sectionModelOnDemand(solver: SectionSolver): SectionModelOnDemand {
  let made: SectionModel | null = null;
  let making: Promise<SectionModel> | null = null;
  const get = (): Promise<SectionModel> =>
    (making ??= import('./section-model').then(
      (m) => (made = new m.SectionModel(solver)),
      (e: unknown) => {
        making = null;
        throw e;
      },
    ));
  return {
    current: () => made,
    get,
    openMember: (member) => {
      if (made) made.openMember(member);
      // Registered before the screen's own wait on get(), so the member is open when the screen first shows.
      else void get().then((m) => m.openMember(member), () => undefined);
    },
  };
}
