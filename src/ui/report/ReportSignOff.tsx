import { useState } from 'preact/hooks';

const KEY = 'wetmode.report.signoff';

interface SignOff {
  preparedBy: string;
  site: string;
}

function load(): SignOff {
  try {
    const v = JSON.parse(localStorage.getItem(KEY) ?? '{}') as Partial<SignOff>;
    return { preparedBy: typeof v.preparedBy === 'string' ? v.preparedBy : '', site: typeof v.site === 'string' ? v.site : '' };
  } catch {
    return { preparedBy: '', site: '' };
  }
}

/**
 * Who prepared the record and where, typed on screen and remembered on this device (not in the case or its
 * link); a checker signs by hand on paper. Printed as a sign-off block.
 */
export function ReportSignOff() {
  const [v, setV] = useState<SignOff>(load);
  const set = (patch: Partial<SignOff>): void => {
    const next = { ...v, ...patch };
    setV(next);
    try {
      localStorage.setItem(KEY, JSON.stringify(next));
    } catch {
      // Storage refused (private mode): the values still print from the page.
    }
  };
  return (
    <section class="report-signoff" aria-label="Sign-off">
      <label class="signoff-cell">
        <span>Prepared by</span>
        <input type="text" value={v.preparedBy} maxLength={80} onInput={(e) => set({ preparedBy: e.currentTarget.value })} />
      </label>
      <label class="signoff-cell">
        <span>Site / location</span>
        <input type="text" value={v.site} maxLength={80} onInput={(e) => set({ site: e.currentTarget.value })} />
      </label>
      <div class="signoff-cell">
        <span>Checked by (name, signature, date)</span>
        <div class="signoff-line" />
      </div>
    </section>
  );
}
