/**
 * The lists of saved records (components/history-list.ts): newest first by their time stamps,
 * ties in the order given, the records left as they were; <check-history> and <fill-history>
 * draw one card per record in that order, and the card is the record's item only (a fill's
 * findings are not drawn as cards). Kind: behaviour; the records are invented, no figure on
 * them is checked.
 */
import { expect, fixture, html } from '@open-wc/testing';
import { newestFirst } from '../../components/history-list.js';
import '../../components/check-history.js';
import '../../components/fill-history.js';
import type { CheckHistory } from '../../components/check-history.js';
import type { FillHistory } from '../../components/fill-history.js';
import { check, tank } from '../../scripts/sync/records.mjs';
import { buildCheckInput } from '../../components/check-input.js';
import { DEFAULT_SETTINGS } from '../../components/types.js';
import { makeFillRecord, startFill } from '../../thermo/fill/index.js';
import { deepAll } from './dom.js';

/** The page's custom properties the cards' borders use (pwa/page.css sets them in the app). */
const PAGE = '--border-width: 2px; --line: black';
const at = (x: { id: string; at: string }) => x.at;

describe('newestFirst', () => {
  it('orders by time stamp, newest first; ties keep their order; the input is left alone', () => {
    const items = [
      { id: 'a', at: '2026-03-01T10:00:00.000Z' },
      { id: 'b', at: '2026-03-03T10:00:00.000Z' },
      { id: 'c', at: '2026-03-02T10:00:00.000Z' },
      { id: 'd', at: '2026-03-03T10:00:00.000Z' },
    ];
    const before = items.map((x) => x.id);
    expect(newestFirst(items, at).map((x) => x.id)).to.deep.equal(['b', 'd', 'c', 'a']);
    expect(items.map((x) => x.id)).to.deep.equal(before);
    expect(newestFirst([], at)).to.deep.equal([]);
  });
});

describe('saved-record lists', () => {
  it('<check-history> shows the checks newest first, each on a bordered card', async () => {
    const checks = [
      check('old', 't', '2026-03-01T10:00:00.000Z'),
      check('new', 't', '2026-03-05T10:00:00.000Z'),
      check('mid', 't', '2026-03-03T10:00:00.000Z'),
    ];
    const el = await fixture<CheckHistory>(
      html`<check-history style=${PAGE} .checks=${checks}></check-history>`,
    );
    const items = deepAll(el, '[data-testid="history-item"]');
    expect(items.map((li) => li.dataset.checkId)).to.deep.equal(['new', 'mid', 'old']);
    expect(getComputedStyle(items[0]!).borderTopStyle).to.equal('solid');
    expect(getComputedStyle(deepAll(el, 'ol')[0]!).listStyleType).to.equal('none');
  });

  it('<fill-history> shows the fills newest first; only the fill itself is a card', async () => {
    // The invented sync tank and its check's readings, as the check screen would send them.
    const built = buildCheckInput(tank('t'), check('c', 't').readings, DEFAULT_SETTINGS);
    const start = startFill(built.input!, undefined, new Date('2026-03-01T09:00:00Z'));
    const one = makeFillRecord({
      id: 'f',
      tankId: 't',
      input: { start, delivered: { volume: 1 }, after: { gaugePercent: 45 } },
      at: new Date('2026-03-01T10:00:00Z'),
    });
    const fills = [
      { ...one, id: 'old', finishedAt: '2026-03-01T10:00:00.000Z' },
      { ...one, id: 'new', finishedAt: '2026-03-04T10:00:00.000Z' },
    ];
    const el = await fixture<FillHistory>(
      html`<fill-history style=${PAGE} .fills=${fills}></fill-history>`,
    );
    const items = deepAll(el, '[data-testid="fill-record-item"]');
    expect(items.map((li) => li.dataset.fillId)).to.deep.equal(['new', 'old']);
    expect(getComputedStyle(items[0]!).borderTopStyle).to.equal('solid');
    const findings = deepAll(el, 'details li');
    expect(findings.length).to.be.greaterThan(0);
    for (const finding of findings)
      expect(getComputedStyle(finding).borderTopStyle).to.equal('none');
  });
});
