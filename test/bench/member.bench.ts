/**
 * Member modal engine cost. The Member form re-solves on every edit, so a whole case (section solves, dry
 * and wet modes, mesh refinement) should fit well inside a frame budget. Members are invented; the
 * 200-element member has seeded random lumped masses so figures repeat run to run.
 */
import { assembleMember, buildMesh, meshBreakpoints, parseMemberModel, solveMember, type MemberModel } from '../../src/physics/beam';
import { type SymBanded, symBandedToDense } from '../../src/physics/linalg/banded';
import { denseGeneralizedEigen, denseLowestModesByInversion } from '../../src/physics/linalg/eigen-dense';
import { lowestModesBanded } from '../../src/physics/linalg/eigen-lanczos';
import pile from '../../examples/member-fender-pile-port-halloran.json';
import riser from '../../examples/member-riser-skerry-alpha.json';
import baffle from '../../examples/member-baffle-marrow-creek.json';
import { report, seeded, time } from './timing';
import { dumpEigenProblem } from './eigen-dump';
import { buildStemModel } from '../../src/kinds/stem/build';

/** 40 m tapered, flooded pile clamped at the root, with seeded lumped masses; 200 equal elements. */
function member200(): MemberModel {
  const rnd = seeded(42);
  return {
    lengthM: 40,
    segments: [
      {
        fromM: 0,
        toM: 40,
        section: { shape: 'tube', outerDiameterM: 1.4, wallThicknessM: 0.03 },
        endSection: { shape: 'tube', outerDiameterM: 1.0, wallThicknessM: 0.02 },
        youngsModulusPa: 210e9,
        densityKgPerM3: 7850,
        contentsDensityKgPerM3: 1025,
      },
    ],
    supports: [{ atM: 0, kind: 'clamped' }],
    // Masses sit on the 0.2 m grid so the mesh stays 200 equal elements.
    masses: Array.from({ length: 5 }, () => ({ atM: 0.2 * Math.round(5 + 190 * rnd()), massKg: 2000 * rnd() })),
    tensionN: 1e5,
  };
}

/** The same member on a uniform mesh of `elements` elements (the masses sit on its grid). */
function systemOf(model: MemberModel, elements: number) {
  const breaks = meshBreakpoints(model);
  const h = model.lengthM / elements;
  const counts = Int32Array.from(breaks.slice(1), (b, i) => Math.round((b - breaks[i]) / h));
  return { breaks, counts, system: assembleMember(model, buildMesh(model, breaks, counts), null) };
}

/** A thermowell tapering 28 → 22 mm inside a 30 mm sleeve: the taper is solved at stations (added-mass.ts). */
function taperedStemInBore(): MemberModel {
  return buildStemModel({
    insertionLengthM: 0.25,
    rootDiameterM: 0.028,
    tipDiameterM: 0.022,
    boreDiameterM: 0.007,
    youngsModulusPa: 193e9,
    materialDensityKgPerM3: 8000,
    liquidDensityKgPerM3: 1000,
    surroundingInnerDiameterM: 0.03,
    rootSupport: { kind: 'rigid' },
  }).model;
}

/** Values and vectors, as a caller that uses the shapes pays (the solver forms vectors only when they are read). */
function modesWithVectors(k: SymBanded, m: SymBanded, count: number): void {
  const out = lowestModesBanded(k, m, count);
  if (out.ok && out.vectors.length !== count * k.n) throw new Error('lowestModesBanded: wrong vector count');
}

export function run(): void {
  const model = member200();
  const { breaks, counts, system } = systemOf(model, 200);
  console.log(`200-element problem: ${system.mesh.z.length - 1} elements, ${system.n} DOFs, half-bandwidth ${system.kTotal.halfBandwidth}`);

  report('lowest 10 modes, banded shift-invert Lanczos', time(() => modesWithVectors(system.kTotal, system.mDry, 10), 50, 10), 5);
  const fine = systemOf(model, 1000).system;
  report('lowest 10 modes, 1000 elements (2000 DOFs)', time(() => modesWithVectors(fine.kTotal, fine.mDry, 10), 30, 5), 16);
  dumpEigenProblem('member-200', system.kTotal, system.mDry, lowestModesBanded(system.kTotal, system.mDry, 10));
  dumpEigenProblem('member-1000', fine.kTotal, fine.mDry, lowestModesBanded(fine.kTotal, fine.mDry, 10));
  const fineOnce = lowestModesBanded(fine.kTotal, fine.mDry, 10);
  if (fineOnce.ok) console.log(`  1000 elements: Lanczos steps ${fineOnce.steps}, restarts ${fineOnce.restarts}`);
  report('assembly of K, K_G, M (200 elements)', time(() => assembleMember(model, buildMesh(model, breaks, counts), null), 50, 10));

  const cases: [string, unknown][] = [
    ['whole case: fender pile, open water (dry+wet, refinement)', pile],
    ['whole case: riser in caisson (1 section solve, dry+wet)', riser],
    ['whole case: baffle by tank wall (1 section solve, dry+wet)', baffle],
    ['whole case: stem 28→22 mm tapered in a 30 mm bore (stations)', taperedStemInBore()],
  ];
  for (const [label, raw] of cases) {
    const m = parseMemberModel(raw);
    const once = solveMember(m);
    if (!once.ok) throw new Error(`${label}: ${once.message}`);
    report(label, time(() => solveMember(m), 30, 5), 16);
    console.log(`  elements ${once.result.mesh.history.join(' → ')}, section solves ${once.result.addedMass?.sectionSolves ?? 0}`);
  }

  // Banded Lanczos against the dense reference (Cholesky + Householder + implicit QL) on the same problem.
  const kd = symBandedToDense(system.kTotal);
  const md = symBandedToDense(system.mDry);
  const banded = lowestModesBanded(system.kTotal, system.mDry, 10);
  const direct = denseGeneralizedEigen(kd, md, system.n);
  const inverted = denseLowestModesByInversion(kd, md, system.n);
  if (!banded.ok || !direct.ok || !inverted.ok) throw new Error('eigen-solver failed');
  const worst = (values: Float64Array): number => {
    let w = 0;
    for (let i = 0; i < 10; i++) w = Math.max(w, Math.abs(Math.sqrt(banded.values[i]) - Math.sqrt(values[i])) / Math.sqrt(values[i]));
    return w;
  };
  report('dense reference on K x = λ M x (all modes)', time(() => denseGeneralizedEigen(kd, md, system.n), 5, 1));
  report('dense reference on M x = μ K x, λ = 1/μ (all modes)', time(() => denseLowestModesByInversion(kd, md, system.n), 5, 1));
  report('banded Lanczos: lowest 10 modes (same problem)', time(() => modesWithVectors(system.kTotal, system.mDry, 10), 50, 10));
  console.log(`max relative frequency difference, lowest 10 modes, banded vs dense inverted pair: ${worst(inverted.values).toExponential(2)}`);
  console.log(`max relative frequency difference, lowest 10 modes, banded vs dense direct pair:   ${worst(direct.values).toExponential(2)}`);
  console.log('  (the direct dense pair loses relative accuracy on low modes: absolute error ~ ε·λmax, λmax/λ1 ~ 1e11 here)');
  console.log(`Lanczos steps ${banded.steps}, restarts ${banded.restarts}, shift ${banded.shift}`);
}
