/**
 * The one other origin the app may reach: the team server, once a team is set up on this phone
 * (pwa/sync/). The page tells the worker when it connects or disconnects
 * (`{ type: 'TEAM_ORIGIN', origin }`); a worker started afresh reads it from the sync's own
 * IndexedDB database (`tankside-sync`, key `team` of store `meta`), never creating it.
 */
let cached: string | null | undefined;

export function setTeamOrigin(origin: string | null): void {
  cached = origin;
}

function readStored(): Promise<string | null> {
  return new Promise((resolve) => {
    let req: IDBOpenDBRequest;
    try {
      req = indexedDB.open('tankside-sync');
    } catch {
      resolve(null);
      return;
    }
    // No database yet: do not create an empty one (the page's upgrade would then never run).
    req.onupgradeneeded = () => req.transaction?.abort();
    req.onerror = () => resolve(null);
    req.onsuccess = () => {
      const db = req.result;
      try {
        const get = db.transaction('meta', 'readonly').objectStore('meta').get('team');
        get.onsuccess = () => {
          const url = (get.result as { url?: unknown } | undefined)?.url;
          db.close();
          try {
            resolve(typeof url === 'string' ? new URL(url).origin : null);
          } catch {
            resolve(null);
          }
        };
        get.onerror = () => {
          db.close();
          resolve(null);
        };
      } catch {
        db.close();
        resolve(null);
      }
    };
  });
}

export async function teamOrigin(): Promise<string | null> {
  if (cached === undefined) cached = await readStored();
  return cached;
}
