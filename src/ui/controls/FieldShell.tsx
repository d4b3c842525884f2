import type { ComponentChildren } from 'preact';

export interface ShellProps {
  id: string;
  label: string;
  error?: string;
  help?: string;
  wide?: boolean;
  /** Marks the wrapper for tests and styles (the form's field key). */
  fieldKey?: string;
}

/** Ids that tie a control to its message and help, for screen readers. */
export function describedBy(id: string, error?: string, help?: string): string | undefined {
  return [error ? `${id}-error` : '', help ? `${id}-help` : ''].filter(Boolean).join(' ') || undefined;
}

/**
 * The frame of every form field: label, the control, the message when what was typed does not read
 * (beside the field, linked to it), and a help line. One piece for the member, resonance and section forms.
 */
export function FieldShell({ id, label, error, help, wide, fieldKey, children, under }: ShellProps & { children: ComponentChildren; under?: ComponentChildren }) {
  return (
    <div class={`field${error ? ' has-error' : ''}${wide ? ' field-wide' : ''}`} data-field={fieldKey}>
      <label for={id}>{label}</label>
      <div class="field-control">{children}</div>
      {under}
      {error && (
        <p class="field-error" id={`${id}-error`}>
          <span aria-hidden="true">✖ </span>
          {error}
        </p>
      )}
      {help && <p class="field-help" id={`${id}-help`}>{help}</p>}
    </div>
  );
}
