/**
 * The "fill limit in detail" section of <check-results>: the maximum filling density (a table
 * rule's own figure), the room left as liquid now and at the base temperatures (worded "over the
 * limit by" when over, never a negative room), the rule's volumetric maximum with a note saying
 * which figure to act on, the binding limit and the others considered. Templates only; they are
 * rendered inside <check-results> and take its styles.
 */
import { html, nothing, type TemplateResult } from 'lit';
import { formatPercent, type DisplayUnits } from './display.js';
import type { TankCheckResult } from '../thermo/check/types.js';
import { T_60F_K } from '../thermo/constants.js';

/** The trade's base temperature, 60 °F, in the user's unit ("60 °F" or "15.6 °C"). */
export function base60(d: DisplayUnits): string {
  return d.format('temperature', T_60F_K).replace(/\.0 /, ' ');
}

/** A room-left volume row; over the limit it reads "over the limit by", never a negative room. */
function roomRow(d: DisplayUnits, testid: string, when: string, m3: number): TemplateResult {
  const over = m3 < 0;
  return html`<dt>${over ? 'Over the limit by, as liquid' : 'Room left as liquid'} ${when}</dt>
    <dd class=${over ? 'over' : ''} data-testid=${testid} data-si=${String(m3)}>
      ${d.format('volume', Math.abs(m3), over ? 'up' : 'down')}
    </dd>`;
}

/**
 * The maximum filling density: a table rule's own figure (42 % stays 42 %, never shown as
 * 41.9 % from the mass rounded down), else the figure of the mass limit rounded down.
 */
function maxFillingDensity(r: TankCheckResult, d: DisplayUnits): TemplateResult {
  const f = r.fillLimit;
  const binding = f.limits.find((l) => l.id === f.binding);
  const rule = binding?.kind === 'rule' && binding.modelAllowance === 0;
  const text = rule
    ? d.format('fraction', binding.fillingDensity, 'nearest')
    : d.format('fraction', f.maxFillingDensity, 'down');
  return html`<span data-testid="max-filling-density" data-si=${String(f.maxFillingDensity)}
      >${text}</span
    >${rule ? html`<span class="muted note"> (the rule’s table figure)</span>` : nothing}`;
}

export function fillLimitDetail(r: TankCheckResult, d: DisplayUnits): TemplateResult {
  const f = r.fillLimit;
  const binding = f.limits.find((l) => l.id === f.binding);
  return html`<section aria-labelledby="h-limit">
    <h3 id="h-limit">Fill limit in detail</h3>
    <dl>
      <dt>Maximum filling density</dt>
      <dd>${maxFillingDensity(r, d)}</dd>
      ${roomRow(d, 'room-left-volume', 'now', f.roomLeftVolume)}
      ${roomRow(d, 'room-left-volume-60f', `at ${base60(d)}`, f.roomLeftVolumeAt60F)}
      ${
        d.unit('temperature') === 'C'
          ? roomRow(d, 'room-left-volume-15c', 'at 15 °C', f.roomLeftVolumeAt15C)
          : nothing
      }
      ${
        f.volumetricMaxPercent !== null
          ? html`<dt>Rule’s lowest volume limit now</dt>
              <dd>${formatPercent(f.volumetricMaxPercent, 'down')}</dd>
              <dd class="act muted" data-testid="volumetric-note">
                The rule’s table figure leaves out the vapour’s mass; act on the stop-at figure,
                ${formatPercent(f.stopAtGaugePercent, 'down')}.
              </dd>`
          : nothing
      }
    </dl>
    <p class="note" data-testid="fill-binding" data-si=${f.binding}>
      The limit that binds:
      ${binding ? html`${binding.description} <span class="muted">(${binding.citation})</span>` : f.binding}
    </p>
    ${
      f.limits.length > 1
        ? html`<p class="note">
            Also considered:
            ${f.limits
              .filter((l) => l.id !== f.binding)
              .map(
                (l) =>
                  html`<br />${l.description}: ${d.format('mass', l.maxMass, 'down')}
                    <span class="muted">(${l.citation})</span>`,
              )}
          </p>`
        : nothing
    }
  </section>`;
}
