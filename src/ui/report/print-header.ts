/**
 * The running header and page numbers of the printed record, as CSS page-margin boxes
 * (`@page { @top-left { content: … } }`, CSS Paged Media Level 3). The case name, tag and time differ per case, so
 * the rule is written at run time into a constructed style sheet (adopted by the document): that is CSSOM, which
 * the app's Content-Security-Policy allows, where an inline <style> would not be.
 */

/** A CSS string literal: quotes and backslashes escaped, line breaks and control characters dropped. */
export function cssString(text: string): string {
  return `"${text.replace(/[\u0000-\u001f\u007f]/g, ' ').replace(/\\/g, '\\\\').replace(/"/g, '\\"')}"`;
}

/** The @page rule with the running header (left), the app (right) and "Page n of N" (bottom right). */
export function pageRule(header: string, appVersion: string): string {
  const small = 'font: 8pt sans-serif; color: #444;';
  return (
    `@page { ` +
    `@top-left { content: ${cssString(header)}; ${small} } ` +
    `@top-right { content: ${cssString(`Wetmode ${appVersion} screening record`)}; ${small} } ` +
    `@bottom-left { content: "Screening estimate, not a design approval: see the cautions on page 1"; ${small} } ` +
    `@bottom-right { content: "Page " counter(page) " of " counter(pages); ${small} } }`
  );
}

/** Adopts the page rule while the report is shown; returns a function that removes it. */
export function adoptPageRule(rule: string): () => void {
  if (typeof CSSStyleSheet === 'undefined' || !('adoptedStyleSheets' in document)) return () => {};
  const sheet = new CSSStyleSheet();
  try {
    sheet.replaceSync(rule);
  } catch {
    return () => {};
  }
  document.adoptedStyleSheets = [...document.adoptedStyleSheets, sheet];
  return () => {
    document.adoptedStyleSheets = document.adoptedStyleSheets.filter((s) => s !== sheet);
  };
}
