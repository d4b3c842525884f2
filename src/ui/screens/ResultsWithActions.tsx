import { ResultsScreen } from './ResultsScreen';
import { ReceivedBanner, ShareActions } from '../cases';
import { useModel } from '../state/context';

/** The Results screen with the received-case banner and the share buttons of the open case. */
export function ResultsWithActions() {
  const [state] = useModel();
  return (
    <ResultsScreen
      banner={state.doc ? <ReceivedBanner doc={state.doc} /> : null}
      actions={state.doc ? <ShareActions doc={state.doc} /> : null}
    />
  );
}
