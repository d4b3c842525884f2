import { statusLine, type StatusInput } from './status';

/** Out-of-date, computing or empty notice above the results, announced politely to screen readers. */
export function StatusBanner(props: StatusInput) {
  const line = statusLine(props);
  return (
    <div class={line ? `results-status results-status-${line.tone}` : 'results-status results-status-none'} role="status" aria-live="polite">
      {line && (
        <>
          {line.tone === 'stale' && (
            <svg class="status-icon" width="20" height="20" viewBox="0 0 20 20" aria-hidden="true">
              <circle cx="10" cy="10" r="8.5" />
              <path d="M10 5 V10.5 L13.5 12.5" />
            </svg>
          )}
          <span>{line.text}</span>
        </>
      )}
    </div>
  );
}
