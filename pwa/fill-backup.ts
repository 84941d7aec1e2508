/**
 * Fill records in the backup file (format 2 on): each validated whole by the engine's
 * `validateFillRecord`, which names the dotted field of the first fault; the fill must belong
 * to a tank in the same file and its id must be unique. A backup of format 1 has no fills.
 */
import { validateFillRecord, type FillRecord } from '../thermo/fill/index.js';
import { InputError } from '../thermo/errors.js';

/** A refusal with a sentence a person can act on ("Fill 2: …"). */
export class FillBackupError extends Error {}

/** Validates the backup's `fills` (absent = none). Throws `FillBackupError`. */
export function validateBackupFills(raw: unknown, tankIds: ReadonlySet<string>): FillRecord[] {
  if (raw === undefined) return [];
  if (!Array.isArray(raw)) throw new FillBackupError('The file: “fills” must be a list');
  const ids = new Set<string>();
  return raw.map((x: unknown, i) => {
    const where = `Fill ${i + 1}`;
    let f: FillRecord;
    try {
      f = validateFillRecord(x);
    } catch (e) {
      if (e instanceof InputError)
        throw new FillBackupError(`${where}: “${e.field}” must be ${e.validRange}`);
      throw new FillBackupError(`${where}: it cannot be read`);
    }
    if (!tankIds.has(f.tankId))
      throw new FillBackupError(`${where}: belongs to a tank that is not in the file`);
    if (ids.has(f.id))
      throw new FillBackupError(`${where}: has the same id as another fill in the file`);
    ids.add(f.id);
    return f;
  });
}
