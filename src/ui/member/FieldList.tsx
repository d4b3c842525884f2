import type { ComponentChildren } from 'preact';
import { isShown, type FieldDef, type FieldErrors, type FieldValues, type UnitSystem } from '../../forms';
import { FieldInput } from './FieldInput';

interface Props {
  fields: readonly FieldDef[];
  values: FieldValues;
  system: UnitSystem;
  errors: FieldErrors;
  placeholderOf: (key: string) => string;
  onInput: (key: string, text: string) => void;
  idPrefix: string;
  moreLabel: string;
  /** Shown under a field, in the same grid cell (the range of an uncertain input); null for nothing. */
  after?: (field: FieldDef) => ComponentChildren;
}

/** Main fields, then the advanced ones under "More" (opened by itself when one of them has a message). */
export function FieldList({ fields, values, system, errors, placeholderOf, onInput, idPrefix, moreLabel, after }: Props) {
  const shown = fields.filter((f) => isShown(fields, f, values));
  const main = shown.filter((f) => !f.advanced);
  const more = shown.filter((f) => f.advanced);
  const moreHasError = more.some((f) => errors[f.key]);
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
    const extra = after?.(f);
    return extra ? (
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
