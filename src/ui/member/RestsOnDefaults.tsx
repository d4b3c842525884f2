import type { Case } from '../../case';
import { defaultsInUse, defaultsWords } from './defaults-in-use';

/** Says, beside a verdict, which uncertain inputs it rests on at their default values (nothing when none). */
export function RestsOnDefaults({ doc }: { doc: Case }) {
  const list = defaultsInUse(doc);
  if (list.length === 0) return null;
  return (
    <p class="rests-on-defaults" data-testid="rests-on-defaults">
      Rests on default values for: {defaultsWords(list)}. Enter measured or drawn values where you have them.
    </p>
  );
}

/** Beside an uncertain input left at its default: that it is a default, and where the default range comes from. */
export function DefaultMark({ doc, fieldKey }: { doc: Case; fieldKey: string }) {
  const d = defaultsInUse(doc).find((x) => x.key === fieldKey);
  if (!d) return null;
  return (
    <p class="default-mark" data-testid={`default-${fieldKey}`}>
      <strong>Default</strong> — {d.source}
    </p>
  );
}
