import { useEffect, useState } from 'preact/hooks';
import { locationOf, photosOf, type Photo, type SiteLocation } from '../../attachments/photo-store';

/** The site photos (thumbnails) and location kept on this device with the case; nothing when there are none. */
export function ReportPhotos({ caseId }: { caseId: string }) {
  const [photos, setPhotos] = useState<Photo[]>([]);
  const [where, setWhere] = useState<SiteLocation | null>(null);
  useEffect(() => {
    void photosOf(caseId).then((r) => setPhotos(r.ok ? r.value : []));
    void locationOf(caseId).then((r) => setWhere(r.ok ? r.value : null));
  }, [caseId]);
  if (photos.length === 0 && !where) return null;
  return (
    <section class="report-section report-photos" aria-labelledby="report-photos-title" data-testid="report-photos">
      <h2 id="report-photos-title">Site evidence</h2>
      {where && (
        <p>
          Location: {where.latitudeDeg.toFixed(5)}°, {where.longitudeDeg.toFixed(5)}° (within about {Math.round(where.accuracyM)} m, {where.at.slice(0, 10)})
        </p>
      )}
      <ul class="photo-list">
        {photos.map((p, i) => (
          <li key={p.id}>
            <img src={p.dataUrl} alt={`Site photo ${i + 1}`} width={150} height={Math.round((150 * p.heightPx) / p.widthPx)} />
          </li>
        ))}
      </ul>
    </section>
  );
}
