/**
 * The system share sheet and the clipboard, as typed answers (the UI words them). Both need a user gesture.
 */

export type ShareAnswer = 'shared' | 'cancelled' | 'unsupported' | 'failed';

interface ShareNavigator {
  share?: (data: ShareData) => Promise<void>;
  canShare?: (data: ShareData) => boolean;
  clipboard?: { writeText?: (text: string) => Promise<void> };
}

function nav(): ShareNavigator | undefined {
  return typeof navigator !== 'undefined' ? (navigator as ShareNavigator) : undefined;
}

/** Opens the system share sheet with the link (`navigator.share`), where there is one. */
export async function shareLink(data: { url: string; title: string; text?: string }, n: ShareNavigator | undefined = nav()): Promise<ShareAnswer> {
  if (!n || typeof n.share !== 'function') return 'unsupported';
  if (typeof n.canShare === 'function' && !n.canShare(data)) return 'unsupported';
  try {
    await n.share(data);
    return 'shared';
  } catch (e) {
    // The user closing the sheet is AbortError: not a failure worth a message.
    return e instanceof Error && e.name === 'AbortError' ? 'cancelled' : 'failed';
  }
}

export type CopyAnswer = 'copied' | 'unsupported' | 'failed';

/** Copies text (the link) to the clipboard. 'unsupported' on insecure origins and old browsers: show the link to copy by hand. */
export async function copyText(text: string, n: ShareNavigator | undefined = nav()): Promise<CopyAnswer> {
  if (!n?.clipboard || typeof n.clipboard.writeText !== 'function') return 'unsupported';
  try {
    await n.clipboard.writeText(text);
    return 'copied';
  } catch {
    return 'failed';
  }
}
