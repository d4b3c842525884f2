/**
 * Resonance screening cost: it runs again on every edit of the Member form (current, rpm, limits), so it should
 * stay far below a frame. Inputs are seeded so figures repeat run to run; the member is invented.
 */
import { screenResonance } from '../../src/physics/excitation/screen';
import type { ScreeningInput } from '../../src/physics/excitation/types';
import { report, seeded, time } from './timing';

function makeCase(modes: number, nodes: number, seed: number): ScreeningInput {
  const rnd = seeded(seed);
  const length = 40;
  const zM = Array.from({ length: nodes }, (_, i) => (length * i) / (nodes - 1));
  return {
    modes: Array.from({ length: modes }, (_, k) => ({
      wetFrequencyHz: 0.3 * (k + 1) ** 2 * (0.9 + 0.2 * rnd()),
      dryFrequencyHz: 0.35 * (k + 1) ** 2,
      zM,
      displacement: zM.map((z) => Math.sin(((k + 0.5) * Math.PI * z) / length)),
    })),
    zones: [
      { fromM: 0, toM: 10, section: { kind: 'circle', outerDiameterM: 1.2 } },
      { fromM: 10, toM: 25, section: { kind: 'circle', outerDiameterM: 1.3 } },
      { fromM: 25, toM: 32, section: { kind: 'circle', outerDiameterM: 1.4 } },
    ],
    flowSpeedMPerS: [
      { zM: 0, speedMPerS: 0.3 },
      { zM: 16, speedMPerS: 0.8 },
      { zM: 32, speedMPerS: 1.4 },
    ],
    effectiveMassKgPerM: 2500,
    stemFrequencyRatioScreen: true,
    waves: { periodMinS: 3, periodMaxS: 15 },
    machinery: [
      { label: 'pump', shaftSpeedHz: 1480 / 60, bladeCount: 6 },
      { label: 'fan', shaftSpeedHz: 10, shaftSpeedMaxHz: 15, bladeCount: 4, shaftOrders: [1, 2, 3] },
    ],
    machineryAgainst: 'wet-and-dry',
  };
}

export function run(): void {
  const small = makeCase(5, 41, 1);
  const typical = makeCase(10, 201, 2);
  const large = makeCase(50, 2001, 3);
  report('screenResonance, 5 modes × 41 nodes, 17 checks/mode', time(() => screenResonance(small), 200, 20), 1);
  report('screenResonance, 10 modes × 201 nodes', time(() => screenResonance(typical), 100, 10), 2);
  report('screenResonance, 50 modes × 2001 nodes', time(() => screenResonance(large), 20, 3), 16);
}
