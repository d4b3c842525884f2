/** The plate-panel form: fields, cross-field checks and the mapping to the plate engine's SI input. */
import { defineForm } from '../../forms/define';
import { heightField, liquidDensityField, PROCESS_LIQUID_PLAUSIBLE, materialFields, POSITIVE, sizeField } from '../../forms/presets';
import type { Choice, ChoiceField, FieldDef } from '../../forms/types';
import type { EdgeCondition, PlateLiquid } from '../../physics/plate';
import { MAX_PLATE_MODES } from '../../physics/plate';
import type { PlateBuild } from '../common/types';
import { buildPlateModel, type PlateInput, validatePlateInput } from './build';

/** Welded = clamped, bolted or seated = simply supported (common practice, no source). */
const EDGE_CHOICES: readonly Choice[] = [
  { value: 'clamped', label: 'Welded (clamped)', help: 'Held against deflection and rotation: a full weld to a stiff wall or floor.' },
  { value: 'simply-supported', label: 'Bolted or seated (simply supported)', help: 'Held against deflection, free to rotate.' },
  { value: 'free', label: 'Free' },
];

function edgeField(key: string, label: string, def: EdgeCondition): ChoiceField {
  return { key, label, type: 'choice', choices: EDGE_CHOICES, default: def };
}

const ACROSS = { key: 'liquidSetting', values: ['across-tank-2', 'across-tank-1'] } as const;
const WALL = { key: 'liquidSetting', values: ['wall-panel-1', 'wall-panel-2'] } as const;
const WET = { key: 'liquidSetting', values: [...ACROSS.values, ...WALL.values] } as const;

const FIELDS: readonly FieldDef[] = [
  heightField('width', 'Plate width', '2', { min: POSITIVE, help: 'Along the bottom edge, left to right. Across a tank, the tank is as wide as the plate.' }),
  heightField('height', 'Plate height', '1', { min: POSITIVE, help: 'Up from the bottom edge (for a horizontal panel or hatch cover, the other side).' }),
  sizeField('thickness', 'Plate thickness', '10'),
  ...materialFields('carbon-steel', { poisson: true }),
  edgeField('leftEdge', 'Left edge', 'clamped'),
  edgeField('rightEdge', 'Right edge', 'clamped'),
  edgeField('bottomEdge', 'Bottom edge', 'clamped'),
  edgeField('topEdge', 'Top edge', 'free'),
  {
    key: 'liquidSetting',
    label: 'Liquid',
    type: 'choice',
    choices: [
      { value: 'across-tank-2', label: 'Across a tank, both sides', help: 'The plate spans the tank crosswise, its bottom edge on the floor; liquid may pass over a free top edge.' },
      { value: 'across-tank-1', label: 'Across a tank, one side', help: 'As above with the other side dry; the liquid must not reach over the top.' },
      { value: 'wall-panel-1', label: 'Wall panel, one face', help: 'A tank-wall or bulkhead panel, gate or hatch: the wall continues beyond every edge and the liquid covers the panel.' },
      { value: 'wall-panel-2', label: 'Wall panel, both faces', help: 'A panel of a wall or bulkhead with liquid on both sides.' },
      { value: 'none', label: 'None (dry plate)' },
    ],
    default: 'across-tank-2',
  },
  heightField('liquidDepth', 'Liquid depth above the bottom edge', '2', {
    min: POSITIVE,
    showWhen: ACROSS,
    help: 'Above the plate’s top the liquid passes over a free top edge (liquid on both faces only).',
  }),
  heightField('endWallDistance', 'Distance to the tank’s end walls', '', {
    optional: true,
    emptyMeans: 'a very long tank',
    min: POSITIVE,
    showWhen: ACROSS,
    help: 'From the plate to the end wall on each wetted side.',
  }),
  heightField('facingWallDistance', 'Distance to a facing wall', '', {
    optional: true,
    emptyMeans: 'open liquid',
    min: POSITIVE,
    showWhen: WALL,
    help: 'A rigid wall parallel to the panel on each wetted side (a double-skin bulkhead, a narrow tank).',
  }),
  { ...liquidDensityField(1000, 'Water 1000 kg/m³, fuels about 800 to 850 kg/m³ (common inputs).', PROCESS_LIQUID_PLAUSIBLE), showWhen: WET },
  {
    key: 'modes',
    label: 'Modes to report',
    type: 'quantity',
    dimension: 'ratio',
    units: { si: '', us: '' },
    default: '6',
    min: { valueSI: 1, inclusive: true },
    max: { valueSI: MAX_PLATE_MODES, inclusive: true },
    advanced: true,
  },
];

export const PLATE_FORM = defineForm<PlateInput, PlateBuild>({
  kind: 'plate-panel',
  title: 'Plate panel',
  summary: 'A rectangular plate held on its edges: a tank baffle welded to the walls and floor, a bulkhead or tank-wall panel, a gate or a hatch cover.',
  fields: FIELDS,
  toInput(r, err): PlateInput | null {
    const width = r.num('width');
    const height = r.num('height');
    const thickness = r.num('thickness');
    // Thin-plate theory: the plate engine takes t up to a fifth of the shorter side (its own limit).
    const thickest = Math.min(width, height) / 5;
    if (!(thickness <= thickest)) err('thickness', `thickness must be at most a fifth of the shorter side (${r.fmt('thickness', thickest)}) for thin-plate theory`);
    const edges = {
      left: r.choice('leftEdge') as EdgeCondition,
      right: r.choice('rightEdge') as EdgeCondition,
      bottom: r.choice('bottomEdge') as EdgeCondition,
      top: r.choice('topEdge') as EdgeCondition,
    };
    const all = Object.values(edges);
    if (!all.includes('clamped') && all.filter((e) => e === 'simply-supported').length < 2) {
      err('topEdge', 'with these edges the plate is not held: weld one edge, or bolt or seat two');
    }
    const modes = r.num('modes');
    if (!Number.isInteger(modes)) err('modes', `modes to report must be a whole number, got ${modes}`);
    const input: PlateInput = {
      widthM: width,
      heightM: height,
      thicknessM: thickness,
      youngsModulusPa: r.num('youngsModulus'),
      poissonRatio: r.num('poissonRatio'),
      densityKgPerM3: r.num('materialDensity'),
      edges,
      modes,
    };
    const setting = r.choice('liquidSetting');
    if (setting !== 'none') {
      const sides = setting.endsWith('-1') ? 1 : 2;
      const liquid: PlateLiquid = { setting: setting.startsWith('wall-panel') ? 'wall-panel' : 'across-tank', densityKgPerM3: r.num('liquidDensity'), sides };
      if (liquid.setting === 'across-tank') {
        const depth = r.num('liquidDepth');
        if (sides === 1 && depth > height) err('liquidDepth', `with liquid on one face the depth must be at most the plate height (${r.fmt('liquidDepth', height)}); deeper liquid pours over the top`);
        liquid.depthM = depth;
        const reach = r.opt('endWallDistance');
        if (reach !== undefined) liquid.reachM = reach;
      } else {
        const reach = r.opt('facingWallDistance');
        if (reach !== undefined) liquid.reachM = reach;
      }
      input.liquid = liquid;
    }
    return input;
  },
  validate: validatePlateInput,
  buildModel: buildPlateModel,
});
