/**
 * What the team sync adds to the shell's screens, so the shell needs one line per place: the
 * conflict view above a tank's screen, the team panel below the Data screen.
 */
import { html, nothing, type TemplateResult } from 'lit';
import '../../components/team-panel.js';
import '../../components/sync-conflict.js';
import { DisplayUnits } from '../../components/display.js';
import type { Settings } from '../../components/types.js';
import type { Route } from '../router.js';

export function syncAddOns(
  route: Route,
  settings: Settings,
  where: 'before' | 'after',
): TemplateResult | typeof nothing {
  if (where === 'before' && (route.name === 'check' || route.name === 'edit'))
    return html`<sync-conflict
      tank-id=${route.id}
      .display=${DisplayUnits.fromSettings(settings)}
    ></sync-conflict>`;
  if (where === 'after' && route.name === 'data') return html`<team-panel></team-panel>`;
  return nothing;
}
