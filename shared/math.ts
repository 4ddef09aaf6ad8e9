/**
 * The one mathjs instance of Panelpoint, built from only the pieces it uses (units, and the
 * parser with the operators and functions study expressions may call). Bundled, it loads in a
 * fraction of the time of the full library. Built on first use: a sweep worker that gets its
 * quantities already in SI never builds it (building it costs each thread about 0.1 s of CPU and
 * as much again in optimising compiler work that would compete with the sweep).
 */
import {
  create, absDependencies, acosDependencies, addDependencies, asinDependencies, atan2Dependencies, atanDependencies,
  cbrtDependencies, ceilDependencies, compareTextDependencies, compileDependencies, coshDependencies, cosDependencies,
  createUnitDependencies, divideDependencies, eDependencies, equalDependencies, equalTextDependencies, expDependencies,
  fixDependencies, floorDependencies, hypotDependencies, isIntegerDependencies, largerDependencies, largerEqDependencies,
  log10Dependencies, log2Dependencies, logDependencies, maxDependencies, minDependencies, modDependencies,
  multiplyDependencies, notDependencies, parseDependencies, piDependencies, powDependencies, roundDependencies,
  signDependencies, sinDependencies, sinhDependencies, smallerDependencies, smallerEqDependencies, sqrtDependencies,
  subtractDependencies, tanDependencies, tanhDependencies, tauDependencies, unaryMinusDependencies, unaryPlusDependencies,
  unequalDependencies, unitDependencies, andDependencies, orDependencies, xorDependencies,
} from 'mathjs';

function build() {
  const m = create({
  parseDependencies, compileDependencies, unitDependencies, createUnitDependencies,
  addDependencies, subtractDependencies, multiplyDependencies, divideDependencies, powDependencies, modDependencies,
  unaryMinusDependencies, unaryPlusDependencies, equalDependencies, unequalDependencies, largerDependencies,
  largerEqDependencies, smallerDependencies, smallerEqDependencies, andDependencies, orDependencies, xorDependencies, notDependencies,
  absDependencies, sqrtDependencies, cbrtDependencies, expDependencies, logDependencies, log10Dependencies, log2Dependencies,
  hypotDependencies, minDependencies, maxDependencies, floorDependencies, ceilDependencies, roundDependencies, fixDependencies,
  signDependencies, sinDependencies, cosDependencies, tanDependencies, asinDependencies, acosDependencies, atanDependencies,
  atan2Dependencies, sinhDependencies, coshDependencies, tanhDependencies, isIntegerDependencies, equalTextDependencies,
  compareTextDependencies, piDependencies, eDependencies, tauDependencies,
  });
  // Trade units mathjs lacks: ksi (kip per square inch), psf (pound-force per square foot),
  // plf and klf (pound-force and kip per linear foot).
  m.createUnit({ ksi: '1000 psi', psf: '1 lbf/ft^2', plf: '1 lbf/ft', klf: '1 kip/ft' });
  return m;
}

let instance: ReturnType<typeof build> | undefined;

/** The shared instance: `mathjs().parse`, `mathjs().unit`, node classes (`mathjs().SymbolNode`...). */
export function mathjs(): ReturnType<typeof build> {
  return (instance ??= build());
}
