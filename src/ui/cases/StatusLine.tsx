import type { Ref } from 'preact';
import './cases.css';

/** One message at a time; a new action replaces it (and with it any Undo offer). */
export interface Status {
  text: string;
  tone: 'info' | 'ok' | 'error';
  /** Label of an action offered beside the message ("Undo", "Export case file", "Reload"). */
  actionLabel?: string;
  action?: () => void;
}

interface Props {
  status: Status | null;
  onDismiss: () => void;
  /** Focus lands here after an action removed the focused button (a deleted row). */
  focusRef?: Ref<HTMLDivElement>;
}

/**
 * The screen's status region: always in the page (so screen readers announce what appears in it), polite,
 * and it stays until dismissed or replaced. Errors say so in words and with an icon shape, not colour alone.
 */
export function StatusLine({ status, onDismiss, focusRef }: Props) {
  return (
    <div class="cases-status-slot" ref={focusRef} tabIndex={-1}>
      <div role="status" aria-live="polite" aria-atomic="true">
        {status && (
          <div class={`cases-status cases-status-${status.tone}`}>
            {status.tone === 'error' && <span class="cases-status-icon" aria-hidden="true">⚠</span>}
            <span class="cases-status-text">
              {status.tone === 'error' && <span class="vh">Problem: </span>}
              {status.text}
            </span>
            <span class="cases-status-actions">
              {status.action && status.actionLabel && (
                <button type="button" class="btn primary" onClick={status.action}>{status.actionLabel}</button>
              )}
              <button type="button" class="btn" onClick={onDismiss}>Dismiss</button>
            </span>
          </div>
        )}
      </div>
    </div>
  );
}
