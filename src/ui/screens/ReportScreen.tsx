import { useEffect, useState } from 'preact/hooks';
import { useModel } from '../state/context';
import { ReportView } from '../report/ReportView';
import { ReportBand } from '../report/ReportBand';
import { encodeCaseLink } from '../../share';
import { hashFor } from '../shell/router';

/** The print view of the open case, with the case link written out. */
export function ReportScreen() {
  const [state] = useModel();
  const doc = state.doc;
  const [link, setLink] = useState<string | null>(null);
  useEffect(() => {
    let live = true;
    setLink(null);
    if (doc) void encodeCaseLink(doc, location.origin + location.pathname).then((l) => live && setLink(l)).catch(() => live && setLink(null));
    return () => {
      live = false;
    };
  }, [doc]);
  if (!doc) {
    return (
      <section class="screen" aria-labelledby="screen-title">
        <h1 id="screen-title" tabIndex={-1}>Report</h1>
        <div class="panel notice">
          <p>No case is open. Open one from <a href={hashFor('cases')}>Cases</a> to print its report.</p>
        </div>
      </section>
    );
  }
  return <ReportView doc={doc} results={state.results} link={link} appVersion={__APP_VERSION__} band={<ReportBand />} />;
}
