/**
 * The Section screen's model: the section being edited, how it is viewed, and its solve. One small
 * observable object created with the app's services (it outlives a visit to another screen, so nothing typed
 * is lost), like the open-case model; the screen subscribes to it and calls its actions.
 *
 * Flow: an edit changes the form → the form is read at once (units, checks, messages by field) → if it reads,
 * the worker solves it (numbers and map, then the energy cross-check). A section opened with a solver input
 * (the open member's) is solved exactly as given — the form shows it in millimetre text — until the form is
 * edited; from then on the form is what is solved. Solving runs only while a screen is attached.
 */
import type { MemberModel } from '../../physics/beam/model';
import type { SectionDof, SectionInput } from '../../physics/section';
import type { UnitSystem } from '../../units';
import type { SectionForm } from './form';
import { formFromInput, leftOutNote } from './form-from-input';
import { sectionFromMember } from './from-member';
import { mapView } from './map-grid';
import type { MapQuantity } from './map-values';
import { SECTION_PRESETS, type SectionPreset } from './presets';
import { readSectionForm, type FormReading } from './read-form';
import { SectionSolves, type SectionSolver, type SolveState } from './section-solves';
import { SURROUND_WORDS, type SectionView } from './view-words';

export interface SectionModelState {
  form: SectionForm;
  /** The solver input the view was opened with, solved as given until the form is edited (null: none). */
  given: SectionInput | null;
  /** The form as read (messages by field; its input when every field reads). */
  reading: FormReading;
  /** What is solved: `given`, else the form's input (null while a field has a message). */
  input: SectionInput | null;
  motion: SectionDof;
  /** Body whose motion is mapped (index into the bodies, kept within their number). */
  body: number;
  quantity: MapQuantity;
  system: UnitSystem;
  /** One line on where the section came from (a preset, a member); empty once edited. */
  about: string;
  view: SectionView;
  solve: SolveState;
}

export class SectionModel {
  private state: SectionModelState;
  private listeners = new Set<() => void>();
  private readonly solves: SectionSolves;
  private attached = 0;

  constructor(solver: SectionSolver, first: SectionPreset = SECTION_PRESETS[0]) {
    this.solves = new SectionSolves(solver, true);
    this.solves.subscribe((solve) => this.set({ solve }));
    const form = first.make();
    const view = first.view ?? 'elevation';
    this.state = {
      form,
      given: null,
      reading: readSectionForm(form, SURROUND_WORDS[view]),
      input: null,
      motion: first.motion,
      body: 0,
      quantity: 'speed',
      system: 'si',
      about: first.about,
      view,
      solve: this.solves.get(),
    };
    this.state.input = this.state.reading.input;
  }

  get(): SectionModelState {
    return this.state;
  }

  subscribe(fn: () => void): () => void {
    this.listeners.add(fn);
    return () => this.listeners.delete(fn);
  }

  /** A screen shows the model: solve what is out of date. The returned function detaches it again. */
  attach(): () => void {
    this.attached++;
    this.solveIfShown();
    let live = true;
    return () => {
      if (!live) return;
      live = false;
      this.attached--;
      // Nobody is looking: stop a slow energy check rather than keep the page's worker busy with it.
      if (this.attached === 0) this.solves.stop();
    };
  }

  pickPreset(p: SectionPreset): void {
    this.open(p.make(), null, { motion: p.motion, about: p.about, view: p.view ?? 'elevation' });
  }

  /** Opens a solver input as it is (solved exactly; the form shows it to 5 significant figures). */
  openInput(input: SectionInput, about: string, view: SectionView = 'elevation'): void {
    const { form, leftOut } = formFromInput(input);
    this.open(form, input, { motion: 'x', about: about + leftOutNote(leftOut), view });
  }

  /** Opens a member's submerged section in its surroundings; false (nothing changed) when nothing is submerged. */
  openMember(model: MemberModel): boolean {
    const s = sectionFromMember(model);
    if (!s) return false;
    this.openInput(s.input, s.about, s.plan ? 'plan' : 'elevation');
    return true;
  }

  /** An edit of the form: from now on the form is what is solved. */
  editForm(form: SectionForm): void {
    const reading = readSectionForm(form, SURROUND_WORDS[this.state.view]);
    this.update({ form, given: null, reading, input: reading.input, about: '' });
  }

  setView(view: SectionView): void {
    // Only the words change; the reading is redone so its messages name the boundaries in the new words.
    const reading = readSectionForm(this.state.form, SURROUND_WORDS[view]);
    this.update({ view, reading, input: this.state.given ?? reading.input });
  }

  setMotion(motion: SectionDof): void {
    this.update({ motion });
  }

  setBody(body: number): void {
    this.update({ body });
  }

  setQuantity(quantity: MapQuantity): void {
    this.set({ quantity });
  }

  setSystem(system: UnitSystem): void {
    this.set({ system });
  }

  private open(form: SectionForm, given: SectionInput | null, extra: Pick<SectionModelState, 'motion' | 'about' | 'view'>): void {
    const reading = readSectionForm(form, SURROUND_WORDS[extra.view]);
    this.update({ form, given, reading, input: given ?? reading.input, body: 0, ...extra });
  }

  /** A change that may need a new solve (input, mapped body or motion). */
  private update(patch: Partial<SectionModelState>): void {
    const next = { ...this.state, ...patch };
    next.body = Math.max(0, Math.min(next.body, next.form.bodies.length - 1));
    this.state = next;
    this.emit();
    this.solveIfShown();
  }

  private set(patch: Partial<SectionModelState>): void {
    this.state = { ...this.state, ...patch };
    this.emit();
  }

  private emit(): void {
    for (const fn of this.listeners) fn();
  }

  private solveIfShown(): void {
    if (this.attached === 0) return;
    const { input, body, motion } = this.state;
    this.solves.run(input, input ? { body, motion, grid: mapView(input).grid } : null);
  }
}
