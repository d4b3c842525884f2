/** Saving text as a file from the browser (a Blob and a temporary link), and reading a chosen file's text. */

/** Starts a download of `text` named `fileName`. Returns an error message, or null when the browser took it. */
export function downloadText(text: string, fileName: string, mime: string): string | null {
  try {
    const url = URL.createObjectURL(new Blob([text], { type: mime }));
    const a = document.createElement('a');
    a.href = url;
    a.download = fileName;
    a.rel = 'noopener';
    document.body.appendChild(a);
    a.click();
    a.remove();
    // Some browsers read the URL after click() returns: revoke a little later.
    setTimeout(() => URL.revokeObjectURL(url), 10_000);
    return null;
  } catch (e) {
    return `The browser would not save the file (${e instanceof Error ? e.message : String(e)}).`;
  }
}
