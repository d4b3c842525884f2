/**
 * Inputs for the office-batch benchmark, made from the example files with seeded variations, so a batch looks like
 * an office's folder of similar members and repeats run to run.
 */
import { readFileSync } from 'node:fs';
import { seeded } from './timing';

const MEMBER_EXAMPLES = [
  'examples/member-fender-pile-port-halloran.json',
  'examples/member-riser-skerry-alpha.json',
  'examples/member-baffle-marrow-creek.json',
  'examples/member-temperature-stem-tern-haven.json',
];

/** Positions along the member scale with its length; section sizes and the surroundings scale together. */
const ALONG = new Set(['lengthM', 'fromM', 'toM', 'atM']);
const ACROSS = /^(outerDiameterM|wallThicknessM|diameterM|widthM|thicknessM|heightM|pointM)$/;

function scaled(value: unknown, key: string, along: number, across: number): unknown {
  if (Array.isArray(value)) return value.map((v) => scaled(v, key, along, across));
  if (value !== null && typeof value === 'object') {
    return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, scaled(v, k, along, across)]));
  }
  if (typeof value !== 'number') return value;
  if (ALONG.has(key)) return Number((value * along).toPrecision(6));
  if (ACROSS.test(key)) return Number((value * across).toPrecision(6));
  return value;
}

/** `count` member models, the four example kinds in seeded random order, lengths ±15 %, sections ±10 %. */
export function memberBatch(count: number, seed = 7): object[] {
  const rnd = seeded(seed);
  const examples = MEMBER_EXAMPLES.map((f) => JSON.parse(readFileSync(f, 'utf8')) as object);
  const out: object[] = [];
  for (let i = 0; i < count; i++) {
    const base = examples[Math.floor(rnd() * examples.length)];
    out.push(scaled(base, '', 0.85 + 0.3 * rnd(), 0.9 + 0.2 * rnd()) as object);
  }
  return out;
}

/** A typed quantity such as "762 mm" times a factor, to four figures: "838.2 mm". */
function times(text: string, factor: number): string {
  const m = /^\s*([\d.]+)\s*(.*)$/.exec(text);
  if (!m) return text;
  return `${Number((Number(m[1]) * factor).toPrecision(4))}${m[2] ? ` ${m[2]}` : ''}`;
}

/** `count` saved pile cases like the example: diameter, wall, depth, deck mass, growth and current varied. */
export function pileCaseBatch(count: number, seed = 11): object[] {
  const rnd = seeded(seed);
  const base = JSON.parse(readFileSync('examples/case-port-halloran-pile.wetmode.json', 'utf8')) as {
    inputs: Record<string, string>;
    excitation: Record<string, string>;
  };
  const out: object[] = [];
  for (let i = 0; i < count; i++) {
    const d = 0.8 + 0.4 * rnd();
    const inputs = {
      ...base.inputs,
      outerDiameter: times(base.inputs.outerDiameter, d),
      wallThickness: times(base.inputs.wallThickness, d),
      waterDepth: times(base.inputs.waterDepth, 0.8 + 0.4 * rnd()),
      topMass: times(base.inputs.topMass, 0.5 + rnd()),
      growthThickness: times(base.inputs.growthThickness, 1.5 * rnd()),
    };
    const excitation = { ...base.excitation, currentSurface: times(base.excitation.currentSurface, 0.5 + rnd()) };
    out.push({ ...base, tag: `${(base as { tag?: string }).tag ?? 'P'}-${i + 1}`, inputs, excitation });
  }
  return out;
}
