/**
 * The Cases screen, the received-case banner and the share buttons.
 *
 *   <CasesScreen />                          // route 'cases'
 *   <ReceivedBanner doc={state.doc} />       // above the results of any open case (shows itself for a received one)
 *   <ReceivedError message={r.message} />    // route 'open' when the link does not decode (whole screen)
 *   <ShareActions doc={state.doc} />         // Copy link, Share…, Export case file, Export results as CSV
 *   <ConflictPrompt />                       // on every screen: a save refused because another tab saved the case
 *   <PersistenceNote />                      // what the browser said about keeping storage (after the first save)
 *
 * `saveOpenCase(store, model)` saves the open case (editable: saveCase; received: saveReceived), marks it saved,
 * clears the draft and asks once for persistent storage: use it for the Member screen's Save button too.
 */
export { CasesScreen } from './CasesScreen';
export { ConflictPrompt } from './ConflictPrompt';
export { ReceivedBanner, ReceivedError } from './ReceivedBanner';
export { ShareActions } from './ShareActions';
export { PersistenceNote, QuotaLine, StorageBanner } from './StorageStatus';
export { StatusLine, type Status } from './StatusLine';
export { docForSaving, exportCaseFile, saveOpenCase, type SaveOutcome } from './open-case';
export { askPersistenceOnce } from './persistence';
export { blankCase } from '../../app/create-case';
export { resultCsvRows, csvFileName } from './results-csv';
