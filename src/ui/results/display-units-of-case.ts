/** The display units a case's results follow, from what was typed (see displayUnitsAsTyped). */
import type { Case } from '../../case';
import { kindOf } from '../../kinds/registry';
export { displayUnitsAsTyped } from './display-units';

/** The case's speed entries (currents, flow speeds) as typed, empty ones left out. */
export function speedTextsOf(doc: Case): string[] {
  return kindOf(doc.kind)
    .resonance.fields.filter((f) => f.type === 'quantity' && f.dimension === 'speed')
    .map((f) => doc.excitation[f.key] ?? '')
    .filter((t) => t.trim() !== '');
}
