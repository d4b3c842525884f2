/**
 * Section solver benchmarks: single bodies at the default resolution, three bodies in an enclosure,
 * and error versus panel count and time for the circle (Lamb: Ca = 1) and the concentric annulus
 * (Fritz 1972: m = ρπR1²(R2² + R1²)/(R2² − R1²)).
 */
import { report, seeded, time } from './timing';
import { solveSection, solveSectionMemo } from '../../src/physics/section/index';
import type { SectionInput } from '../../src/physics/section/types';

const RHO = 1025;

function must(input: SectionInput, panelsPerBody?: number) {
  const o = solveSection(input, panelsPerBody ? { panelsPerBody } : {});
  if (!o.ok) throw new Error(`bench input failed: ${o.message}`);
  return o.result;
}

export function run(): void {
  const circle: SectionInput = { liquidDensityKgPerM3: RHO, bodies: [{ shape: 'circle', diameterM: 0.6 }] };
  const square: SectionInput = { liquidDensityKgPerM3: RHO, bodies: [{ shape: 'rectangle', widthM: 0.5, heightM: 0.5 }] };
  const plate: SectionInput = { liquidDensityKgPerM3: RHO, bodies: [{ shape: 'plate', widthM: 1.2, thicknessM: 0.012 }] };
  report('single circle, default resolution', time(() => must(circle), 40, 10), 10);
  report('single square, default resolution', time(() => must(square), 40, 10), 10);
  report('single plate t/w = 1/100, default resolution', time(() => must(plate), 20, 5));

  // Three bodies at seeded positions inside a circular tank.
  const rnd = seeded(7);
  const three: SectionInput = {
    liquidDensityKgPerM3: RHO,
    bodies: [
      { shape: 'circle', diameterM: 0.4, centerM: [-0.9 + 0.1 * rnd(), 0.1 * rnd()] },
      { shape: 'rectangle', widthM: 0.4, heightM: 0.2, cornerRadiusM: 0.02, centerM: [0.8, 0.1 * rnd()], angleDeg: 30 },
      { shape: 'ellipse', widthM: 0.5, heightM: 0.25, centerM: [0, 0.8 + 0.1 * rnd()] },
    ],
    boundaries: [{ kind: 'enclosure', shape: 'circle', diameterM: 3.2 }],
  };
  report('three bodies in a circular enclosure, default', time(() => must(three), 10, 3), 100);
  // Four circles in a row 0.1 D above a wall (invented layout), at the default accuracy (64 panels per body,
  // doubled once to 128 only if the estimate misses 0.1 % on the translational terms).
  const four: SectionInput = {
    liquidDensityKgPerM3: RHO,
    bodies: [0, 1, 2, 3].map((k) => ({ shape: 'circle' as const, diameterM: 0.5, centerM: [0.8 * k, 0.3] as [number, number] })),
    boundaries: [{ kind: 'wall', pointM: [0, 0], normal: [0, 1] }],
  };
  const rFour = must(four);
  const worstFour = Math.max(...rFour.errorEstimates.filter((e) => e.motion !== 'rotation').map((e) => e.relativeError));
  report('four circles 0.1 D above a wall, default accuracy', time(() => must(four), 10, 2), 10);
  console.log(`  panels per body ${rFour.panelsPerBody} (${rFour.bodies[0].panels} on each circle), largest estimated relative error (x, y) ${worstFour.toExponential(2)}`);
  report('four circles 0.1 D above a wall, fixed 128 panels (the old default)', time(() => must(four, 128), 5, 1));
  solveSectionMemo(four);
  report('four circles 0.1 D above a wall, answered from the section memo', time(() => solveSectionMemo(four), 200, 20), 10);
  // A 1 % annulus gap at the default: true error against Fritz and the estimate (which must be at least it).
  const narrow: SectionInput = { liquidDensityKgPerM3: RHO, bodies: [{ shape: 'circle', diameterM: 1 }], boundaries: [{ kind: 'enclosure', shape: 'circle', diameterM: 1.01 }] };
  const rn = must(narrow);
  const fritzNarrow = (RHO * Math.PI * 0.25 * (0.505 ** 2 + 0.25)) / (0.505 ** 2 - 0.25);
  report('annulus with a 1 % gap, default accuracy', time(() => must(narrow), 5, 1));
  console.log(`  true error ${((rn.bodies[0].addedMassX - fritzNarrow) / fritzNarrow).toExponential(2)}, estimated ${rn.errorEstimates[0].relativeError.toExponential(2)}, panels per body ${rn.panelsPerBody} (${rn.bodies[0].panels} on the circle)`);
  const t = time(() => solveSection(circle, { energyCheck: true }), 5, 1);
  report('single circle with the energy cross-check', t);

  console.log('\nError versus panel count (N panels per body at the finest level; time includes N/2 and N/4):');
  console.log('  N     circle Ca error   est.      time ms  |  annulus error    est.      time ms');
  const R1 = 0.5, R2 = 1;
  const annulus: SectionInput = {
    liquidDensityKgPerM3: RHO,
    bodies: [{ shape: 'circle', diameterM: 2 * R1 }],
    boundaries: [{ kind: 'enclosure', shape: 'circle', diameterM: 2 * R2 }],
  };
  const fritz = (RHO * Math.PI * R1 * R1 * (R2 * R2 + R1 * R1)) / (R2 * R2 - R1 * R1);
  for (const N of [64, 128, 256, 512, 1024]) {
    const runs = N >= 512 ? 3 : 10;
    const rc = must(circle, N);
    const tc = time(() => must(circle, N), runs, 1);
    const ra = must(annulus, N);
    const ta = time(() => must(annulus, N), N >= 1024 ? 1 : runs, N >= 1024 ? 0 : 1);
    const ec = rc.bodies[0].caX - 1;
    const ea = (ra.bodies[0].addedMassX - fritz) / fritz;
    console.log(
      `  ${String(N).padEnd(5)} ${ec.toExponential(2).padStart(10)}  ${rc.errorEstimates[0].relativeError.toExponential(2).padStart(9)}  ${tc.medianMs.toFixed(1).padStart(9)}  |  ${ea.toExponential(2).padStart(10)}  ${ra.errorEstimates[0].relativeError.toExponential(2).padStart(9)}  ${ta.medianMs.toFixed(1).padStart(9)}`,
    );
  }
}
