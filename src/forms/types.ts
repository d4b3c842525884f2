/**
 * Guided forms: the fields of each member kind as the surveyor sees them, and the reading of what was typed
 * into the SI input of the member builders (src/kinds/<kind>/build.ts). Shared by the app and the command line.
 *
 * Values are kept as typed, one string per field key (`{ outerDiameter: '610', wallThickness: '0.5 in' }`).
 * A bare number takes the field's unit for the chosen unit system; a number with a unit is read as typed.
 */
import type { KindBuild, MemberBuild } from '../kinds/common/types';
import type { KindId } from '../kinds/registry-pure';
import type { Dimension, UnitSystem } from '../units';

/** The member kind (the ids are listed once, in src/kinds/registry-pure.ts). */
export type MemberKind = KindId;
export type { UnitSystem };

/** Text as typed, by field key. */
export type FieldValues = Record<string, string>;

/** Messages by field key; form-wide messages (not tied to one field) use FORM_ERROR_KEY. */
export type FieldErrors = Record<string, string>;
export const FORM_ERROR_KEY = '_form';

interface FieldBase {
  key: string;
  /** Short label in trade words, sentence case: "Outer diameter". */
  label: string;
  /** One or two plain sentences; where a default comes from a source, the source is named here. */
  help?: string;
  /** Shown under "More" rather than in the main list. */
  advanced?: boolean;
  /** May be left empty; `emptyMeans` says what empty stands for (shown as the placeholder). */
  optional?: boolean;
  emptyMeans?: string;
  /** Shown, and read, only while another (choice) field has one of these values. */
  showWhen?: { key: string; values: readonly string[] };
}

/**
 * A soft range on a quantity, SI: a value outside it is accepted, with a warning beside the field, in the
 * results and in the report. `basis` says where the range comes from (a source, or "common practice").
 */
export interface Plausible {
  min?: number;
  max?: number;
  basis: string;
}

/** Warnings by field key (same keys as FieldErrors): accepted values that look implausible. */
export type FieldWarnings = Record<string, string>;

/** Limits on a quantity, SI. */
export interface Bound {
  valueSI: number;
  inclusive: boolean;
}

export interface QuantityField extends FieldBase {
  type: 'quantity';
  dimension: Dimension;
  /** Unit shown beside the field in each system (and taken by a bare number). '' = plain number, '%' = per cent. */
  units: Readonly<Record<UnitSystem, string>>;
  /** Default as typed in the SI system: a bare number in `units.si`, or '' for an optional field. */
  default: string;
  min?: Bound;
  max?: Bound;
  /** Soft range (a warning, not a refusal). */
  plausible?: Plausible;
  /** Hint added to a refusal by the hard range, e.g. "did you mean 1025 kg/m³ or 1.025 t/m³?" for a typed 1.025. */
  didYouMean?: (valueSI: number, system: UnitSystem) => string | undefined;
  /** When left empty, the value comes from the chosen option of this choice field (its `presets`). */
  presetFrom?: string;
}

/** Several quantities in one field, typed as "3 m, 12 m, 21 m" (or with semicolons and decimal commas). */
export interface QuantityListField extends FieldBase {
  type: 'quantity-list';
  dimension: Dimension;
  units: Readonly<Record<UnitSystem, string>>;
  default: string;
  min?: Bound;
  max?: Bound;
  plausible?: Plausible;
}

export interface Choice {
  value: string;
  label: string;
  help?: string;
  /** SI values this option supplies to quantity fields left empty (their `presetFrom` names this field). */
  presets?: Readonly<Record<string, number>>;
}

export interface ChoiceField extends FieldBase {
  type: 'choice';
  choices: readonly Choice[];
  default: string;
}

export type FieldDef = QuantityField | QuantityListField | ChoiceField;

/** `warnings` (possibly empty): accepted values outside their soft range, by field key. */
export type ToInputResult<I> = { ok: true; input: I; warnings: FieldWarnings } | { ok: false; errors: FieldErrors };
export type BuildResult<I, B extends KindBuild = MemberBuild> = { ok: true; input: I; build: B; warnings: FieldWarnings } | { ok: false; errors: FieldErrors };

/** The form of one member kind; `I` is the kind's SI input (src/kinds/<kind>/build.ts), `B` what it builds. */
export interface MemberForm<I = unknown, B extends KindBuild = MemberBuild> {
  kind: MemberKind;
  /** "Pile", "Riser or conductor", … */
  title: string;
  /** One sentence saying what the member is and how it is held. */
  summary: string;
  /** In display order; main fields first, then advanced. At most about twelve main fields. */
  fields: readonly FieldDef[];
  /** Field values for a fresh form in a unit system (defaults re-expressed for 'us'). */
  defaults(system: UnitSystem): FieldValues;
  /**
   * Reads the values into the SI input, checking each field and then the fields against each other. Messages
   * are in the user's units: "wall thickness must be less than half the outer diameter (305 mm)". Keys missing
   * from `values` take their defaults; fields hidden by `showWhen` are not read.
   */
  toInput(values: FieldValues, system: UnitSystem): ToInputResult<I>;
  /** The member model and schematic data (src/kinds/<kind>/build.ts). Throws RangeError only for input that toInput would refuse. */
  buildModel(input: I): B;
  /** toInput then buildModel. */
  build(values: FieldValues, system: UnitSystem): BuildResult<I, B>;
  /** Re-expresses values typed for one system in the other's units (see convertFieldValues). */
  convertValues(values: FieldValues, from: UnitSystem, to: UnitSystem): FieldValues;
}

/** A worked example in an invented setting, with values as typed (units included). */
export interface DemoCase {
  kind: MemberKind;
  name: string;
  tag: string;
  note: string;
  /** The system the values were typed in (bare numbers take that system's units). */
  system: UnitSystem;
  values: FieldValues;
  /** Resonance inputs as typed (src/forms/excitation.ts); missing keys take their defaults. */
  excitation?: FieldValues;
}
