/** The shell's header: the brand and the main navigation, the current screen's section marked. */
import { html, nothing, type TemplateResult } from 'lit';
import type { Route } from './router.js';

export function appHeader(r: Route['name']): TemplateResult {
  const current = (names: Route['name'][]) => (names.includes(r) ? 'page' : nothing);
  return html`<header>
    <h1 class="brand">Tankside</h1>
    <nav aria-label="Main">
      <a
        class="button"
        href="#/"
        data-testid="nav-tanks"
        aria-current=${current(['tanks', 'check', 'edit', 'new', 'fill', 'site', 'walk', 'walkdown'])}
        >Tanks</a
      >
      <a
        class="button"
        href="#/settings"
        data-testid="nav-settings"
        aria-current=${current(['settings'])}
        >Settings</a
      >
      <a class="button" href="#/data" data-testid="nav-data" aria-current=${current(['data'])}
        >Data</a
      >
    </nav>
  </header>`;
}
