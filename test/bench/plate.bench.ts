/**
 * Plate-panel cost: dry modes (Rayleigh–Ritz) and wet modes in both liquid settings at the default resolution,
 * each solved twice (default and coarse, for the error estimate), as the app's worker will run them.
 * Target: ≤ 100 ms for a plate, dry and wet.
 * Each run starts with the engine's memo cleared, so these are first solves of a plate (what a keystroke on the
 * width, height, edges or liquid geometry costs); a repeat of a solved shape costs well under a millisecond.
 */
import { clearPlateMemos, parsePlateInput, solvePlate } from '../../src/physics/plate';
import baffle from '../../examples/plate-marrow-creek-baffle.json';
import gate from '../../examples/plate-port-halloran-gate-panel.json';
import { report, time } from './timing';

function must(raw: unknown) {
  const input = parsePlateInput(raw);
  return () => {
    clearPlateMemos();
    const o = solvePlate(input);
    if (!o.ok) throw new Error(`bench input failed: ${o.message}`);
    return o;
  };
}

export function run(): void {
  const dryOnly = { ...baffle } as Record<string, unknown>;
  delete dryOnly.liquid;
  report('plate dry only (10 × 10 Ritz terms, + coarse check)', time(must(dryOnly), 20, 5), 100);
  report('plate across a tank, liquid over the top edge', time(must(baffle), 20, 5), 100);
  report('plate across a tank, level at the top edge', time(must({ ...baffle, liquid: { ...baffle.liquid, depthM: 1 } }), 20, 5), 100);
  report('wall panel, one face, half-space', time(must(gate), 20, 5), 100);
  report('wall panel, both faces, closing wall 0.5 m', time(must({ ...gate, liquid: { ...gate.liquid, sides: 2, reachM: 0.5 } }), 20, 5), 100);
}
