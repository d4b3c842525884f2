/**
 * The Section view's numbers as table text: per-body added mass, Ca with its reference area, ratio to the
 * displaced liquid, error estimates, the energy cross-check and the full matrix with its labels and units.
 * Values arrive in SI per metre; US shows lb/ft, lb·ft/ft and lb·ft²/ft (conversion by src/units).
 */
import type { BodyResult, BodySpec, EnergyCheck, ErrorEstimate, SectionDof, SectionResult } from '../../physics/section';
import { formatNumber, unitFactor, unitLabel, type UnitSystem } from '../../units';
import { formatSig } from '../format/numbers';

export interface SectionUnits {
  /** Translation–translation terms and masses per length. */
  perLength: string;
  /** Translation–rotation terms. */
  coupling: string;
  /** Rotation–rotation terms. */
  inertia: string;
  size: string;
  area: string;
}

const UNITS: Record<UnitSystem, SectionUnits> = {
  si: { perLength: 'kg/m', coupling: 'kg m/m', inertia: 'kg m^2/m', size: 'mm', area: 'm^2' },
  us: { perLength: 'lb/ft', coupling: 'lb ft/ft', inertia: 'lb ft^2/ft', size: 'in', area: 'ft^2' },
};

export function sectionUnits(system: UnitSystem): SectionUnits {
  return UNITS[system];
}

export const MOTION_WORDS: Record<SectionDof, string> = { x: 'sway (x)', y: 'heave (y)', rotation: 'rotation' };
const SHORT: Record<SectionDof, string> = { x: 'x', y: 'y', rotation: 'θ' };
const DOFS: SectionDof[] = ['x', 'y', 'rotation'];

/** Label of row/column i of the added-mass matrix: "body 1 x", "body 2 θ". */
export function dofLabel(i: number): string {
  return `body ${Math.floor(i / 3) + 1} ${SHORT[DOFS[i % 3]]}`;
}

/** The unit of matrix entry (i, j): per length, coupling or rotary inertia. */
export function entryUnit(i: number, j: number, u: SectionUnits): string {
  const rot = Number(i % 3 === 2) + Number(j % 3 === 2);
  return rot === 0 ? u.perLength : rot === 1 ? u.coupling : u.inertia;
}

/** A value in a unit, four significant figures, without the unit: for cells whose header carries it. */
export function num(valueSI: number, unit: string, digits = 4): string {
  return formatSig(valueSI / unitFactor(unit), digits);
}

const NBSP = '\u00a0';

/** A value with its unit, joined by a no-break space so a narrow table never splits them: "201.2 kg/m". */
export function withUnit(valueSI: number, unit: string, digits = 4): string {
  return `${num(valueSI, unit, digits)}${NBSP}${unitLabel(unit)}`;
}

/**
 * Size below which a matrix entry is round-off: 1e-7 of ρA for translation and ρA² for rotation (A the body's
 * wetted area), the geometric mean of the two for a coupling term. A circle turning about its centre moves no
 * liquid; its 1e-31 kg·m²/m shows as 0. (The solver's error estimates use the same scales, 1e-6.)
 */
export function negligible(r: SectionResult, i: number, j: number): number {
  const scale = (d: number) => {
    const b = r.bodies[Math.floor(d / 3)];
    return d % 3 === 2 ? b.displacedMassKgPerM * b.wettedAreaM2 : b.displacedMassKgPerM;
  };
  return 1e-7 * Math.sqrt(scale(i) * scale(j));
}

/** A matrix entry as shown: 0 when below the round-off size. */
export function entryValue(r: SectionResult, i: number, j: number): number {
  const v = r.addedMass[i][j];
  return Math.abs(v) < negligible(r, i, j) ? 0 : v;
}

/** "±0.012 %" from a relative error; "< 0.001 %" when smaller; "—" for none or a term that is round-off. */
export function errorText(e: ErrorEstimate | undefined, r?: SectionResult): string {
  if (!e || (r && entryValue(r, e.dof, e.dof) === 0)) return '—';
  if (e.relativeError < 1e-5) return '< 0.001 %';
  return `±${formatSig(e.relativeError * 100, 2)} %`;
}

/** An area in m² (ft²), or in mm² (in²) when under 0.01 m² (ft²): "0.1963 m²", "490.9 mm²". */
export function areaText(areaM2: number, u: SectionUnits): string {
  return withUnit(areaM2, areaM2 / unitFactor(u.area) < 0.01 ? `${u.size}^2` : u.area);
}

/** Reference area for Ca, π a², with a: "0.1963 m² (a = 250 mm)". */
export function referenceAreaText(halfWidthM: number, u: SectionUnits): string {
  const a = `a${NBSP}=${NBSP}${formatNumber(halfWidthM / unitFactor(u.size), 4)}${NBSP}${u.size}`;
  return `${areaText(Math.PI * halfWidthM * halfWidthM, u)} (${a})`;
}

export interface BodyRow {
  label: string;
  x: string;
  y: string;
  rotation: string;
}

/** The per-body table: one row per quantity, one column per motion. */
export function bodyRows(r: SectionResult, k: number, u: SectionUnits): BodyRow[] {
  const b: BodyResult = r.bodies[k];
  const est = (d: number) => r.errorEstimates.find((e) => e.dof === 3 * k + d);
  const blocked = (d: SectionDof) => b.blockedDofs.includes(d);
  const cell = (d: SectionDof, text: string) => (blocked(d) ? 'blocked' : text);
  return [
    {
      label: 'Added mass per metre',
      x: cell('x', withUnit(b.addedMassX, u.perLength)),
      y: cell('y', withUnit(b.addedMassY, u.perLength)),
      rotation: cell('rotation', withUnit(entryValue(r, 3 * k + 2, 3 * k + 2), u.inertia)),
    },
    { label: 'Ca', x: cell('x', formatSig(b.caX, 4)), y: cell('y', formatSig(b.caY, 4)), rotation: '—' },
    {
      label: 'Reference area π a²',
      x: referenceAreaText(b.referenceHalfWidthXM, u),
      y: referenceAreaText(b.referenceHalfWidthYM, u),
      rotation: '—',
    },
    {
      label: 'Added / displaced liquid mass',
      x: cell('x', formatSig(b.addedToDisplacedX, 4)),
      y: cell('y', formatSig(b.addedToDisplacedY, 4)),
      rotation: '—',
    },
    { label: 'Error estimate', x: errorText(est(0), r), y: errorText(est(1), r), rotation: errorText(est(2), r) },
  ];
}

export interface EnergyRow {
  label: string;
  unit: string;
  boundary: string;
  field: string;
  difference: string;
  /** Set when the two disagree by more than ENERGY_FLAG: the field grid cannot resolve this flow well. */
  flag: string | null;
}

/**
 * Disagreement above which a cross-check row is flagged. The grid check agrees within about 3 % wherever the
 * flow spreads over several cells (measured on circles, squares, walls and annuli); a larger gap means the flow
 * is concentrated below the grid's scale (a thin plate moving edgewise), not that the boundary value is wrong.
 */
export const ENERGY_FLAG = 0.05;

/** One row per diagonal term: the boundary-integral value (reported) and the field integral ρ∫|∇φ|² dA. */
export function energyRows(checks: readonly EnergyCheck[], u: SectionUnits): EnergyRow[] {
  return checks.map((c) => {
    const unit = c.motion === 'rotation' ? u.inertia : u.perLength;
    const sign = c.relativeDifference > 0 ? '+' : '';
    return {
      label: `body ${c.body + 1} ${MOTION_WORDS[c.motion]}`,
      unit: unitLabel(unit),
      boundary: num(c.boundaryIntegral, unit),
      field: num(c.fieldIntegral, unit),
      difference: Number.isFinite(c.relativeDifference) ? `${sign}${formatSig(c.relativeDifference * 100, 2)} %` : '—',
      flag:
        Math.abs(c.relativeDifference) > ENERGY_FLAG
          ? 'The field grid is too coarse for this flow (it is concentrated near edges or in a thin gap); rely on the boundary value and its error estimate.'
          : null,
    };
  });
}

/** The matrix as text cells, row by row. */
export function matrixCells(r: SectionResult, u: SectionUnits): string[][] {
  return r.addedMass.map((row, i) => row.map((_, j) => num(entryValue(r, i, j), entryUnit(i, j, u))));
}

/** A body in a few words for table captions: "circle 500 mm", "rectangle 400 × 200 mm at 30°". */
export function describeBody(b: BodySpec, length: (m: number) => string): string {
  const angle = 'angleDeg' in b && b.angleDeg ? ` at ${formatNumber(b.angleDeg, 4)}°` : '';
  switch (b.shape) {
    case 'circle':
      return `circle ${length(b.diameterM)}`;
    case 'ellipse':
      return `ellipse ${length(b.widthM)} × ${length(b.heightM)}${angle}`;
    case 'rectangle':
      return `rectangle ${length(b.widthM)} × ${length(b.heightM)}${b.cornerRadiusM ? `, corner radius ${length(b.cornerRadiusM)}` : ''}${angle}`;
    case 'plate':
      return `plate ${length(b.widthM)} × ${length(b.thicknessM)}${angle}`;
    case 'polygon':
      return `polygon of ${b.pointsM.length} points${angle}`;
  }
}
