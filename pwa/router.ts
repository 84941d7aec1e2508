/**
 * Hash routes. A hash never reaches the server, so every deep link (`#/tank/<id>`) loads the
 * same precached index.html and works offline; the service worker's navigation fallback covers
 * any path-style link as well.
 */
export type Route =
  | { name: 'tanks' }
  | { name: 'check'; id: string }
  | { name: 'edit'; id: string }
  | { name: 'fill'; id: string }
  | { name: 'new' }
  | { name: 'settings' }
  | { name: 'data' }
  | { name: 'site'; site: string }
  | { name: 'walk'; id: string }
  | { name: 'walkdown'; id: string }
  | { name: 'not-found'; path: string };

export function parseRoute(hash: string): Route {
  const path = hash.replace(/^#/, '').replace(/^\/+/, '').replace(/\/+$/, '');
  const parts = path.split('/').map((p) => {
    try {
      return decodeURIComponent(p);
    } catch {
      return p;
    }
  });
  const [a, b, c] = parts;
  if (path === '' || (a === 'tanks' && parts.length === 1)) return { name: 'tanks' };
  if (a === 'tank' && b === 'new' && parts.length === 2) return { name: 'new' };
  if (a === 'tank' && b && parts.length === 2) return { name: 'check', id: b };
  if (a === 'tank' && b && c === 'edit' && parts.length === 3) return { name: 'edit', id: b };
  if (a === 'tank' && b && c === 'fill' && parts.length === 3) return { name: 'fill', id: b };
  if (a === 'settings' && parts.length === 1) return { name: 'settings' };
  if (a === 'data' && parts.length === 1) return { name: 'data' };
  if (a === 'site' && b && parts.length === 2) return { name: 'site', site: b };
  if (a === 'walk' && b && parts.length === 2) return { name: 'walk', id: b };
  if (a === 'walkdown' && b && parts.length === 2) return { name: 'walkdown', id: b };
  return { name: 'not-found', path };
}

export function href(route: Route): string {
  switch (route.name) {
    case 'tanks':
      return '#/';
    case 'check':
      return `#/tank/${encodeURIComponent(route.id)}`;
    case 'edit':
      return `#/tank/${encodeURIComponent(route.id)}/edit`;
    case 'fill':
      return `#/tank/${encodeURIComponent(route.id)}/fill`;
    case 'new':
      return '#/tank/new';
    case 'settings':
      return '#/settings';
    case 'data':
      return '#/data';
    case 'site':
      return `#/site/${encodeURIComponent(route.site)}`;
    case 'walk':
      return `#/walk/${encodeURIComponent(route.id)}`;
    case 'walkdown':
      return `#/walkdown/${encodeURIComponent(route.id)}`;
    case 'not-found':
      return '#/';
  }
}
