/**
 * What the lists of saved records (<check-history>, <fill-history>) share: newest first, and
 * each record drawn as a card with its time in bold, its figures, and the rest on demand.
 */
import { css, unsafeCSS, type CSSResult } from 'lit';

/** A new array of `items`, newest first by their ISO time stamp `at(item)`; ties keep their order. */
export function newestFirst<T>(items: readonly T[], at: (item: T) => string): T[] {
  return [...items].sort((a, b) => (at(a) < at(b) ? 1 : at(a) > at(b) ? -1 : 0));
}

/** The list's styles; `card` selects one saved record's list item. */
export function historyStyles(card: 'li' | 'li.fill'): CSSResult {
  return css`
    ol {
      list-style: none;
      padding: 0;
      margin: 0;
    }
    ${unsafeCSS(card)} {
      border: var(--border-width) solid var(--line);
      border-radius: 0.5rem;
      padding: 0.6rem;
      margin-bottom: 0.6rem;
      background: var(--paper);
    }
    .when {
      font-weight: 800;
    }
    .figs {
      margin: 0.25rem 0;
    }
    summary {
      min-height: 48px;
      display: flex;
      align-items: center;
      cursor: pointer;
      font-weight: 600;
    }
  `;
}
