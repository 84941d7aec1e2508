/** Document ids of the team database: `<kind>:<key>` (kept apart so the app shell stays small). */
export const SYNC_KINDS = ['tank', 'check', 'fill', 'walkdown', 'site'] as const;
export type SyncKind = (typeof SYNC_KINDS)[number];

export function docIdOf(kind: SyncKind, key: string): string {
  return `${kind}:${key}`;
}
