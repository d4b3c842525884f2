import { addBody, patchBody, removeBody, type FieldErrors, type SectionForm } from './form';
import { MAX_EDITOR_BODIES } from './read-form';
import { BodyCard } from './BodyCard';

interface Props {
  form: SectionForm;
  errors: FieldErrors;
  /** Words of the Add button ("Add a body", or "Add a neighbour pile or body" in a plan view). */
  addLabel?: string;
  /** The axes in a few words ("x to the right, y up"). */
  axes?: string;
  onChange: (form: SectionForm) => void;
}

/** The bodies of the section, each in its own card, with Add and Remove. */
export function BodyList({ form, errors, addLabel = 'Add a body', axes = 'x to the right, y up', onChange }: Props) {
  const full = form.bodies.length >= MAX_EDITOR_BODIES;
  return (
    <div class="section-bodies">
      <h2 class="section-subhead">Bodies</h2>
      <p class="field-help">Sizes in mm unless you type a unit (24 in, 0.6 m). {axes}, from the origin of the section.</p>
      {errors['bodies'] && (
        <p class="field-error" role="alert">
          <span aria-hidden="true">✖ </span>
          {errors['bodies']}
        </p>
      )}
      {form.bodies.map((b, i) => (
        <BodyCard
          key={b.id}
          body={b}
          index={i}
          errors={errors}
          canRemove={form.bodies.length > 1}
          onChange={(patch) => onChange(patchBody(form, b.id, patch))}
          onRemove={() => onChange(removeBody(form, b.id))}
        />
      ))}
      <button type="button" class="btn" disabled={full} onClick={() => onChange(addBody(form))}>
        {addLabel}
      </button>
      {full && <p class="field-help">At most {MAX_EDITOR_BODIES} bodies.</p>}
    </div>
  );
}
