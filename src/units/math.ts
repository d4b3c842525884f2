/**
 * The one mathjs instance used to read quantities typed by people. Built with `create` from only the factories
 * it needs, so the bundle carries the expression parser, units and the arithmetic operators, nothing more.
 * tsc cannot tell when an operator is missing (mathjs looks it up by name at evaluation time and throws
 * "Function subtract missing"), so test/units/parse.test.ts evaluates an expression with each one.
 */
import {
  addDependencies,
  create,
  createUnitDependencies,
  divideDependencies,
  evaluateDependencies,
  multiplyDependencies,
  powDependencies,
  subtractDependencies,
  unaryMinusDependencies,
  unaryPlusDependencies,
  unitDependencies,
  type Unit,
} from 'mathjs';

const math = create({
  evaluateDependencies,
  unitDependencies,
  createUnitDependencies,
  addDependencies, // 2 ft + 6 in
  subtractDependencies, // 3 m - 10 cm
  multiplyDependencies, // 2 * 3 m, and the implicit product of number and unit: 610 mm
  divideDependencies, // 7.85 t/m^3, 1/2 in
  powDependencies, // kg/m^3
  unaryMinusDependencies, // -2 m
  unaryPlusDependencies, // +2 m
});

/**
 * Units mathjs lacks, in trade use. mathjs already has t (tonne, 1000 kg), kip (kip-force), psi, lbf, lbm/lb,
 * in, ft, kgf, Hz; note that its `ton` is the US short ton (907.18474 kg).
 */
math.createUnit('ksi', { definition: '1000 psi' }); // kilo-pound per square inch (US modulus and stress)
math.createUnit('pcf', { definition: '1 lbm/ft^3' }); // pound per cubic foot (US density)
math.createUnit('pci', { definition: '1 lbf/in^3' }); // pound-force per cubic inch (US soil modulus gradient)
math.createUnit('rpm', { definition: math.unit(1 / 60, 'Hz') }); // revolutions per minute, as a frequency
math.createUnit('knot', { definition: math.unit(1852 / 3600, 'm/s'), aliases: ['knots', 'kn'] }); // international knot

/** Evaluates a typed expression: a plain number, or a mathjs Unit (value in SI base units). Throws on error. */
export function evaluateText(text: string): number | Unit {
  return math.evaluate(text) as number | Unit;
}

/**
 * Evaluates a typed expression and says whether it named any unit. mathjs turns a dimensionless result such
 * as `5 mm/m` into the plain number 0.005, which must not then be taken as a bare number in the field's unit.
 */
export function evaluateWithUnits(text: string): { value: number | Unit; namedUnits: boolean } {
  const node = math.parse(text);
  const namedUnits = node.filter((n) => math.isSymbolNode(n)).length > 0;
  return { value: node.evaluate() as number | Unit, namedUnits };
}

export function isUnit(v: unknown): v is Unit {
  return math.isUnit(v);
}
