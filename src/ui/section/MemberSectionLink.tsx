import type { MemberModel } from '../../physics/beam/model';
import { hashFor } from '../shell/router';
import { useServices } from '../state/context';

/**
 * Opens the Section view on this member's submerged section and surroundings (its added mass and flow map),
 * solved exactly as the member engine sees it. A member with nothing submerged opens the Section view as it was.
 */
export function MemberSectionLink({ model, label = 'Section view' }: { model: MemberModel | null; label?: string }) {
  const { section } = useServices();
  const onClick = () => {
    if (model) section.openMember(model);
  };
  return (
    <a class="btn" href={hashFor('section')} onClick={onClick}>
      {label}
    </a>
  );
}
