import type { ComponentChildren } from 'preact';
import { isShown, type FieldDef, type FieldErrors, type FieldValues, type UnitSystem } from '../../forms';
import { FieldInput } from './FieldInput';

interface Props {
  fields: readonly FieldDef[];
  values: FieldValues;
  system: UnitSystem;
  errors: FieldErrors;
  /** Accepted values outside their soft range: a note under the field, not an error. */
  warnings?: FieldErrors;
  placeholderOf: (key: string) => string;
  onInput: (key: string, text: string) => void;
  idPrefix: string;
  moreLabel: string;
  /** Shown under a field, in the same grid cell (the range of an uncertain input); null for nothing. */
  after?: (field: FieldDef) => ComponentChildren;
}

/** Main fields, then the advanced ones under "More" (opened by itself when one of them has a message). */
export function FieldList({ fields, values, system, errors, warnings = {}, placeholderOf, onInput, idPrefix, moreLabel, after }: Props) {
  const shown = fields.filter((f) => isShown(fields, f, values));
  const main = shown.filter((f) => !f.advanced);
  const more = shown.filter((f) => f.advanced);
  const moreHasError = more.some((f) => errors[f.key] || warnings[f.key]);
  const render = (f: FieldDef) => {
    const input = (
      <FieldInput
        key={f.key}
        field={f}
        value={values[f.key] ?? f.default}
        system={system}
        error={errors[f.key]}
        placeholder={placeholderOf(f.key)}
        onInput={(t) => onInput(f.key, t)}
        idPrefix={idPrefix}
      />
    );
    const note = !errors[f.key] && warnings[f.key];
    const extra = (
      <>
        {note && (
          <p class="field-warning" data-testid={`warning-${f.key}`}>
            <span aria-hidden="true">⚠ </span>
            {note}
          </p>
        )}
        {after?.(f)}
      </>
    );
    const hasExtra = Boolean(note) || Boolean(after?.(f));
    return hasExtra ? (
      <div class="field-stack" key={f.key}>
        {input}
        {extra}
      </div>
    ) : (
      input
    );
  };
  return (
    <>
      <div class="field-grid">{main.map(render)}</div>
      {more.length > 0 && (
        <details class="more" open={moreHasError || undefined}>
          <summary>{moreLabel}{moreHasError ? ' — has a message' : ''}</summary>
          <div class="field-grid">{more.map(render)}</div>
        </details>
      )}
    </>
  );
}
