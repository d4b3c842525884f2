import type { MemberModel } from '../../physics/beam/model';
import { hashFor } from '../shell/router';
import { sectionFormFromMember } from './from-member';

/**
 * Opens the Section view on this member's submerged section and surroundings (its added mass and flow map).
 * A member with nothing submerged opens the Section view as it was.
 */
export function MemberSectionLink({ model, label = 'Section view' }: { model: MemberModel | null; label?: string }) {
  const onClick = () => {
    const s = model ? sectionFormFromMember(model) : null;
    // The Section view is a chunk of its own; the form is handed over before the route change renders it.
    if (s) void import('./SectionScreen').then((m) => m.loadSectionForm(s.form, s.about));
  };
  return (
    <a class="btn" href={hashFor('section')} onClick={onClick}>
      {label}
    </a>
  );
}
