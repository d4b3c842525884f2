import { useEffect, useState } from 'preact/hooks';
import { decodeCasePayload } from '../../share';
import { useModel } from '../state/context';
import { ReceivedError } from '../cases';

/**
 * A shared link (`#/open/<payload>`): decodes the case in the page (nothing is sent anywhere), opens it as
 * received and shows its results. A broken link gets its message and changes nothing.
 */
export function OpenLinkScreen({ payload }: { payload: string }) {
  const [, model] = useModel();
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    let live = true;
    void decodeCasePayload(payload).then((r) => {
      if (!live) return;
      if (!r.ok) {
        setError(r.message);
        return;
      }
      model.open(r.value, 'received', false);
      location.replace('#/results');
    });
    return () => {
      live = false;
    };
  }, [payload, model]);
  if (error) return <ReceivedError message={error} />;
  return (
    <section class="screen" aria-labelledby="screen-title">
      <h1 id="screen-title" tabIndex={-1}>Opening a shared case…</h1>
    </section>
  );
}
