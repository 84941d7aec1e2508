/**
 * The team database's documents: one per record, `<kind>:<key>` (`tank:<id>`, `check:<id>`,
 * `fill:<id>`, `walkdown:<id>`, `site:<site name>`), holding the record exactly as the phone
 * stores it under `record`. `validateSyncDoc` checks a document with the backup import's own
 * validators (pwa/backup.ts, pwa/fill-backup.ts's engine check, pwa/walkdown-backup.ts), so the
 * server's `validate_doc_update` (built from this file by scripts/sync/design-doc.mjs) refuses
 * exactly what an import would refuse, and follows any change of the record format.
 *
 * A record written by a phone whose app is older than the pressure names that say gauge or
 * absolute (storage v5, backup format 3) carries the old names: `upgradeSyncRecord` renames them
 * (pwa/legacy-names.ts, as the backup import does for a format-2 file), the check runs on the
 * renamed record, and the pull stores the renamed record; so such a record is accepted and read,
 * never dropped.
 */
import { Invalid, validateCheck, validateTank } from '../backup.js';
import { WalkInvalid, validateSite, validateWalkdown } from '../walkdown-backup.js';
import { validateFillRecord } from '../../thermo/fill/index.js';
import { InputError } from '../../thermo/errors.js';
import { upgradeCheck, upgradeFill, upgradeTank, upgradeWalkdown } from '../legacy-names.js';

import { SYNC_KINDS, docIdOf, type SyncKind } from './ids.js';
export { SYNC_KINDS, docIdOf, type SyncKind };

/** Format of the document wrapper (not of the record inside it). */
export const SYNC_DOC_VERSION = 1;

export interface SyncDoc {
  _id: string;
  _rev?: string;
  _deleted?: boolean;
  _conflicts?: string[];
  v: number;
  kind: SyncKind;
  record: unknown;
}

/** The kind and key of a document id, or null for an id that is not a record's. */
export function parseDocId(id: string): { kind: SyncKind; key: string } | null {
  const colon = id.indexOf(':');
  if (colon < 1) return null;
  const kind = id.slice(0, colon);
  const key = id.slice(colon + 1);
  if (!(SYNC_KINDS as readonly string[]).includes(kind) || key === '') return null;
  return { kind: kind as SyncKind, key };
}

/** The key of a record of `kind` (a site forecast is keyed by its site's name). */
export function keyOf(kind: SyncKind, record: unknown): string {
  const r = record as { id?: unknown; site?: unknown };
  const k = kind === 'site' ? r.site : r.id;
  return typeof k === 'string' ? k : '';
}

/** A record of `kind` under the current names (a teammate's older app may send the old ones). */
export function upgradeSyncRecord(kind: SyncKind, record: unknown): unknown {
  switch (kind) {
    case 'tank':
      return upgradeTank(record);
    case 'check':
      return upgradeCheck(record);
    case 'fill':
      return upgradeFill(record);
    case 'walkdown':
      return upgradeWalkdown(record);
    case 'site':
      return record;
  }
}

function checkRecord(kind: SyncKind, record: unknown): void {
  switch (kind) {
    case 'tank':
      validateTank(record, 0);
      return;
    case 'check':
      validateCheck(record, 0, null);
      return;
    case 'fill':
      validateFillRecord(record);
      return;
    case 'walkdown':
      validateWalkdown(record, 0);
      return;
    case 'site':
      validateSite(record, 0);
      return;
  }
}

/** Why a (non-deleted) document may not be stored, in words; null when it is valid. */
export function validateSyncDoc(doc: unknown): string | null {
  if (typeof doc !== 'object' || doc === null) return 'The document is not an object';
  const d = doc as Partial<SyncDoc>;
  if (d.v !== SYNC_DOC_VERSION) return `“v” must be ${SYNC_DOC_VERSION}`;
  const parsed = typeof d._id === 'string' ? parseDocId(d._id) : null;
  if (!parsed) return `The id must be one of ${SYNC_KINDS.join(', ')} followed by “:” and a key`;
  if (d.kind !== parsed.kind) return `“kind” must be ${parsed.kind}, as the id says`;
  try {
    checkRecord(parsed.kind, upgradeSyncRecord(parsed.kind, d.record));
  } catch (e) {
    if (e instanceof Invalid || e instanceof WalkInvalid) return e.message;
    if (e instanceof InputError) return `Fill: “${e.field}” must be ${e.validRange}`;
    return 'The record cannot be read';
  }
  if (keyOf(parsed.kind, d.record) !== parsed.key)
    return `The id's key must be the record's ${parsed.kind === 'site' ? 'site' : 'id'}`;
  return null;
}
