/**
 * Named moments of the page's start (User Timing marks, "wetmode:…"), each set once: the script starting, the
 * device store open, the first solve asked for, its answer received, the UI mounted. The first-load measurement
 * (test/e2e/support/first-load.ts) prints them, so a slow first answer says which step took the time. Free when
 * nobody reads them; silently skipped where the User Timing API is missing.
 */
const done = new Set<string>();

export function markOnce(name: string): void {
  if (done.has(name)) return;
  done.add(name);
  try {
    performance.mark(name);
  } catch {
    // No User Timing here (an old browser or a test environment): nothing to note.
  }
}
