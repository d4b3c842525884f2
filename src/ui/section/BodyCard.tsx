import { BODY_SHAPES, bodyKey, type BodyForm, type BodyShape, type FieldErrors } from './form';
import { TextField } from '../controls/TextField';

interface Props {
  body: BodyForm;
  /** Position in the list, from 0. */
  index: number;
  errors: FieldErrors;
  canRemove: boolean;
  onChange: (patch: Partial<Omit<BodyForm, 'id'>>) => void;
  onRemove: () => void;
}

type SizeField = 'diameter' | 'width' | 'height' | 'thickness' | 'cornerRadius';

/** Size fields shown per shape, with their labels ("across x" = before rotation). */
const SIZES: Record<BodyShape, readonly [SizeField, string][]> = {
  circle: [['diameter', 'Diameter']],
  rectangle: [
    ['width', 'Width (across x)'],
    ['height', 'Height (across y)'],
    ['cornerRadius', 'Corner radius'],
  ],
  ellipse: [
    ['width', 'Width (across x)'],
    ['height', 'Height (across y)'],
  ],
  plate: [
    ['width', 'Width (across x)'],
    ['thickness', 'Thickness (across y)'],
  ],
  polygon: [],
};

/** One body of the section: its shape, sizes, position and angle, with messages beside the fields. */
export function BodyCard({ body, index, errors, canRemove, onChange, onRemove }: Props) {
  const id = (f: string) => `sec-${body.id}-${f}`;
  const err = (f: keyof BodyForm) => errors[bodyKey(body, f)];
  const whole = errors[bodyKey(body)];
  const field = (f: keyof BodyForm, label: string, unit: string, extra: { help?: string; placeholder?: string } = {}) => (
    <TextField
      id={id(f)}
      label={label}
      value={body[f] as string}
      unit={unit}
      error={err(f)}
      onInput={(t) => onChange({ [f]: t })}
      {...extra}
    />
  );
  return (
    <fieldset class={`section-body${whole ? ' has-error' : ''}`} aria-describedby={whole ? id('whole') : undefined}>
      <legend>Body {index + 1}</legend>
      {whole && (
        <p class="field-error" id={id('whole')} role="alert">
          <span aria-hidden="true">✖ </span>
          {whole}
        </p>
      )}
      <div class="field-grid section-fields">
        <div class="field">
          <label for={id('shape')}>Shape</label>
          <select id={id('shape')} value={body.shape} onChange={(e) => onChange({ shape: (e.target as HTMLSelectElement).value as BodyShape })}>
            {BODY_SHAPES.map((s) => (
              <option key={s.value} value={s.value}>{s.label}</option>
            ))}
          </select>
        </div>
        {SIZES[body.shape].map(([f, label]) =>
          field(f, label, 'mm', f === 'cornerRadius' ? { placeholder: '0', help: 'Empty or 0: sharp corners.' } : {}),
        )}
        {body.shape === 'polygon' && (
          <TextField
            id={id('points')}
            label="Corner points x y (mm, from the centre)"
            value={body.points}
            mode="text"
            wide
            error={err('points')}
            help='In order around the outline, as "x1 y1, x2 y2, …"; at least 3 points.'
            onInput={(t) => onChange({ points: t })}
          />
        )}
        {field('x', 'Centre x', 'mm', { placeholder: '0' })}
        {field('y', 'Centre y', 'mm', { placeholder: '0' })}
        {body.shape !== 'circle' && field('angle', 'Angle (anticlockwise)', '°', { placeholder: '0' })}
      </div>
      {canRemove && (
        <button type="button" class="btn section-remove" onClick={onRemove}>
          Remove body {index + 1}
        </button>
      )}
    </fieldset>
  );
}
