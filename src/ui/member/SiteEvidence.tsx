import { useEffect, useState } from 'preact/hooks';
import { addPhoto, deletePhoto, locationOf, photosOf, setLocation, type Photo, type SiteLocation } from '../../attachments/photo-store';
import { downscalePhoto } from '../../attachments/downscale';
import { newCaseId } from '../../store';

/**
 * Photos taken or picked on the tablet, and the site location (asked only when tapped), kept on this device
 * beside the case and in its exported case file, never in the link, and the panel says so.
 */
export function SiteEvidence({ caseId, readOnly }: { caseId: string; readOnly: boolean }) {
  const [photos, setPhotos] = useState<Photo[]>([]);
  const [where, setWhere] = useState<SiteLocation | null>(null);
  const [message, setMessage] = useState('');
  const reload = async () => {
    const p = await photosOf(caseId);
    setPhotos(p.ok ? p.value : []);
    const l = await locationOf(caseId);
    setWhere(l.ok ? l.value : null);
    if (!p.ok) setMessage(p.message);
  };
  useEffect(() => {
    void reload();
    // eslint-disable-next-line react-hooks/exhaustive-deps -- read again for another case only
  }, [caseId]);

  const onFiles = async (files: FileList | null) => {
    for (const f of Array.from(files ?? [])) {
      try {
        const d = await downscalePhoto(f);
        const r = await addPhoto({ id: newCaseId(), caseId, takenAt: new Date().toISOString(), ...d });
        setMessage(r.ok ? 'Photo kept on this device.' : r.message);
      } catch (e) {
        setMessage(`Could not read that photo: ${e instanceof Error ? e.message : String(e)}`);
      }
    }
    await reload();
  };
  const locate = () => {
    if (!navigator.geolocation) return setMessage('This browser cannot give a location.');
    setMessage('Asking for the location…');
    navigator.geolocation.getCurrentPosition(
      async (p) => {
        const r = await setLocation({ caseId, latitudeDeg: p.coords.latitude, longitudeDeg: p.coords.longitude, accuracyM: p.coords.accuracy, at: new Date().toISOString() });
        setMessage(r.ok ? 'Location kept on this device.' : r.message);
        await reload();
      },
      (e) => setMessage(`No location: ${e.message || 'permission refused'}.`),
      { enableHighAccuracy: true, timeout: 20_000 },
    );
  };
  const remove = async (id: string) => {
    const r = await deletePhoto(id);
    setMessage(r.ok ? 'Photo removed.' : r.message);
    await reload();
  };
  return (
    <div class="site-evidence" data-testid="site-evidence">
      <p class="field-help">Photos and the location stay on this device with the case. They go into the exported case file too, never into the case link.</p>
      {!readOnly && (
        <div class="cases-buttons">
          <label class="btn file-button">
            Add photo
            <input type="file" accept="image/*" capture="environment" multiple class="visually-hidden" data-testid="photo-input" onChange={(e) => void onFiles((e.target as HTMLInputElement).files)} />
          </label>
          <button type="button" class="btn" onClick={locate}>{where ? 'Update location' : 'Add location'}</button>
        </div>
      )}
      {where && (
        <p data-testid="site-location">
          Location: {where.latitudeDeg.toFixed(5)}°, {where.longitudeDeg.toFixed(5)}° (within about {Math.round(where.accuracyM)} m)
        </p>
      )}
      {photos.length > 0 && (
        <ul class="photo-list">
          {photos.map((p) => (
            <li key={p.id}>
              <img src={p.dataUrl} alt={`Site photo taken ${p.takenAt.slice(0, 16).replace('T', ' ')}`} width={120} height={Math.round((120 * p.heightPx) / p.widthPx)} />
              {!readOnly && (
                <button type="button" class="btn" onClick={() => void remove(p.id)}>Remove</button>
              )}
            </li>
          ))}
        </ul>
      )}
      <p class="status" role="status" aria-live="polite">{message}</p>
    </div>
  );
}
