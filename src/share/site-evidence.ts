/**
 * Site evidence in a case file: the photos (JPEG data URLs) and the location kept on the device with a case,
 * carried in the file as an optional top-level `siteEvidence` member beside the case. It is not part of the case
 * schema, so the stored case and the link stay as they are, and a file without it is still a case file.
 *
 * On import every part is checked on its own: a bad photo or location is dropped with a note saying what was
 * expected and what was found, and never stops the case itself from opening.
 */
import { got } from '../case/describe';

export interface EvidencePhoto {
  /** "data:image/jpeg;base64,…" */
  dataUrl: string;
  takenAt: string;
  widthPx: number;
  heightPx: number;
}

export interface EvidenceLocation {
  latitudeDeg: number;
  longitudeDeg: number;
  accuracyM: number;
  at: string;
}

export interface SiteEvidence {
  photos: EvidencePhoto[];
  location: EvidenceLocation | null;
}

/** Most photos a file carries; the app keeps a handful per case. */
export const MAX_FILE_PHOTOS = 12;
/**
 * Longest photo data URL. The app stores photos downscaled to 1600 px on the longer side as JPEG (quality 0.82),
 * a few hundred kB; 700 000 base64 characters are about 512 kB of JPEG.
 */
export const MAX_PHOTO_DATA_URL_CHARS = 700_000;
/** Longest side of a photo, px: the app never stores larger (src/attachments/downscale.ts). */
const MAX_PHOTO_SIDE_PX = 10_000;

const JPEG_DATA_URL = /^data:image\/jpeg;base64,[A-Za-z0-9+/]+={0,2}$/;

export interface ReadEvidence {
  evidence: SiteEvidence;
  /** What was left out, one plain sentence each (empty when everything was kept). */
  dropped: string[];
}

const isTime = (v: unknown): v is string => typeof v === 'string' && v.length <= 40 && !Number.isNaN(Date.parse(v));
const isSize = (v: unknown): v is number => typeof v === 'number' && Number.isInteger(v) && v >= 1 && v <= MAX_PHOTO_SIDE_PX;

/** Null when the photo is usable; otherwise why not. */
function photoProblem(p: unknown): string | null {
  if (typeof p !== 'object' || p === null || Array.isArray(p)) return `expected an object with dataUrl, takenAt, widthPx and heightPx; ${got(p)}`;
  const r = p as Record<string, unknown>;
  const url = r.dataUrl;
  if (typeof url !== 'string') return `expected dataUrl to be a JPEG data URL; ${got(url)}`;
  if (url.length > MAX_PHOTO_DATA_URL_CHARS) return `expected a photo data URL of at most ${MAX_PHOTO_DATA_URL_CHARS} characters; got ${url.length}`;
  if (!JPEG_DATA_URL.test(url)) return `expected a JPEG data URL (data:image/jpeg;base64,…); ${got(url)}`;
  if (!isTime(r.takenAt)) return `expected takenAt to be a date and time; ${got(r.takenAt)}`;
  if (!isSize(r.widthPx) || !isSize(r.heightPx)) return `expected widthPx and heightPx to be whole numbers from 1 to ${MAX_PHOTO_SIDE_PX}; widthPx ${got(r.widthPx)}, heightPx ${got(r.heightPx)}`;
  return null;
}

function readLocation(l: unknown): EvidenceLocation | string {
  if (typeof l !== 'object' || l === null || Array.isArray(l)) return `expected an object with latitudeDeg, longitudeDeg, accuracyM and at; ${got(l)}`;
  const r = l as Record<string, unknown>;
  const num = (v: unknown, lo: number, hi: number): v is number => typeof v === 'number' && Number.isFinite(v) && v >= lo && v <= hi;
  if (!num(r.latitudeDeg, -90, 90)) return `expected latitudeDeg from −90 to 90; ${got(r.latitudeDeg)}`;
  if (!num(r.longitudeDeg, -180, 180)) return `expected longitudeDeg from −180 to 180; ${got(r.longitudeDeg)}`;
  if (!num(r.accuracyM, 0, 1e7)) return `expected accuracyM, metres, from 0 to 10 000 000; ${got(r.accuracyM)}`;
  if (!isTime(r.at)) return `expected at to be a date and time; ${got(r.at)}`;
  return { latitudeDeg: r.latitudeDeg, longitudeDeg: r.longitudeDeg, accuracyM: r.accuracyM, at: r.at };
}

/** Reads a file's `siteEvidence` member. Never throws; whatever is not usable is dropped and said in `dropped`. */
export function readSiteEvidence(raw: unknown): ReadEvidence {
  const dropped: string[] = [];
  const evidence: SiteEvidence = { photos: [], location: null };
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    dropped.push(`the site evidence was left out: expected an object with photos and location; ${got(raw)}`);
    return { evidence, dropped };
  }
  const r = raw as Record<string, unknown>;
  const photos = r.photos ?? [];
  if (!Array.isArray(photos)) {
    dropped.push(`the photos were left out: expected a list of photos; ${got(photos)}`);
  } else {
    photos.forEach((p, i) => {
      if (i >= MAX_FILE_PHOTOS) return;
      const why = photoProblem(p);
      if (why) dropped.push(`photo ${i + 1} was left out: ${why}`);
      else {
        const q = p as EvidencePhoto;
        evidence.photos.push({ dataUrl: q.dataUrl, takenAt: q.takenAt, widthPx: q.widthPx, heightPx: q.heightPx });
      }
    });
    if (photos.length > MAX_FILE_PHOTOS) dropped.push(`photos ${MAX_FILE_PHOTOS + 1} to ${photos.length} were left out: a case file carries at most ${MAX_FILE_PHOTOS} photos`);
  }
  if (r.location !== undefined && r.location !== null) {
    const l = readLocation(r.location);
    if (typeof l === 'string') dropped.push(`the location was left out: ${l}`);
    else evidence.location = l;
  }
  return { evidence, dropped };
}
