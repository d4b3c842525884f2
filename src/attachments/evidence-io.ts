/**
 * The site evidence of a case between the attachment store and a case file: read for export, restored on
 * import. Restoring adds; it never overwrites: each photo gets a new id (a photo already kept for the case, same
 * picture, is not added twice), and a location is set only when the case has none on this device.
 */
import type { SiteEvidence } from '../share/site-evidence';
import { newCaseId } from '../store/new-case';
import { addPhoto, locationOf, photosOf, setLocation, type Kept } from './photo-store';

/** The photos (oldest first) and location kept for a case, as a case file carries them. */
export async function evidenceOf(caseId: string, factory?: IDBFactory): Promise<Kept<SiteEvidence>> {
  const photos = await photosOf(caseId, factory);
  if (!photos.ok) return photos;
  const where = await locationOf(caseId, factory);
  if (!where.ok) return where;
  const l = where.value;
  return {
    ok: true,
    value: {
      photos: photos.value.map((p) => ({ dataUrl: p.dataUrl, takenAt: p.takenAt, widthPx: p.widthPx, heightPx: p.heightPx })),
      location: l ? { latitudeDeg: l.latitudeDeg, longitudeDeg: l.longitudeDeg, accuracyM: l.accuracyM, at: l.at } : null,
    },
  };
}

export interface Restored {
  photosAdded: number;
  /** Photos left alone because the same picture is already kept for the case. */
  photosAlreadyKept: number;
  locationSet: boolean;
  /** True when the file's location was left alone because the case already has one on this device. */
  locationKept: boolean;
}

/** Adds a file's evidence to the store under `caseId`. */
export async function restoreEvidence(caseId: string, e: SiteEvidence, factory?: IDBFactory): Promise<Kept<Restored>> {
  const kept = await photosOf(caseId, factory);
  if (!kept.ok) return kept;
  const have = new Set(kept.value.map((p) => p.dataUrl));
  const out: Restored = { photosAdded: 0, photosAlreadyKept: 0, locationSet: false, locationKept: false };
  for (const p of e.photos) {
    if (have.has(p.dataUrl)) {
      out.photosAlreadyKept++;
      continue;
    }
    const r = await addPhoto({ id: newCaseId(), caseId, ...p }, factory);
    if (!r.ok) return r;
    have.add(p.dataUrl);
    out.photosAdded++;
  }
  if (e.location) {
    const where = await locationOf(caseId, factory);
    if (!where.ok) return where;
    if (where.value) out.locationKept = true;
    else {
      const r = await setLocation({ caseId, ...e.location }, factory);
      if (!r.ok) return r;
      out.locationSet = true;
    }
  }
  return { ok: true, value: out };
}

/** What the import did with the evidence, in words ('' when the file carried none). */
export function restoredText(r: Restored, dropped: readonly string[]): string {
  const parts: string[] = [];
  if (r.photosAdded > 0) parts.push(`${r.photosAdded} site photo${r.photosAdded === 1 ? '' : 's'} kept on this device with the case`);
  if (r.photosAlreadyKept > 0) parts.push(`${r.photosAlreadyKept} photo${r.photosAlreadyKept === 1 ? ' was' : 's were'} already kept`);
  if (r.locationSet) parts.push('the site location kept');
  if (r.locationKept) parts.push('the location already kept on this device was left as it was');
  const said = parts.length > 0 ? `${parts.join('; ')}.` : '';
  const left = dropped.length > 0 ? ` From the site evidence, ${dropped.join('; ')}.` : '';
  return `${said.charAt(0).toUpperCase()}${said.slice(1)}${left}`.trim();
}
