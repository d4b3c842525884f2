/**
 * Sharing a case: links (`#/open/<payload>`, nothing sent to a server), case files, CSV, share sheet and clipboard.
 *
 * ```ts
 * const link = await encodeCaseLink(c, location.origin + location.pathname);
 * // on the receiving side, with route.payload from the router:
 * const r = await decodeCasePayload(route.payload);   // { ok: true, value } | { ok: false, message }
 * ```
 */
export { decodeCaseLink, decodeCasePayload, encodeCaseLink, encodeCasePayload, LINK_MESSAGES, MAX_PAYLOAD_CHARS, type DecodeResult } from './link';
export { caseToWire, linkView } from './wire';
export { CASE_FILE_EXTENSION, CASE_FILE_MIME, caseFileName, caseFromFileText, caseToFileText, type CaseFileResult } from './file';
export { MAX_FILE_PHOTOS, readSiteEvidence, type SiteEvidence } from './site-evidence';
export { resultsToCsv, type CsvCell, type CsvOptions } from './csv';
export { copyText, shareLink, type CopyAnswer, type ShareAnswer } from './share-sheet';
