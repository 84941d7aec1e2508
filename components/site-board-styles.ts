/** The site board's own styles (components/site-board.ts). */
import { css } from 'lit';

export const siteBoardStyles = css`
  ol {
    list-style: none;
    margin: 0;
    padding: 0;
  }
  li.row {
    /* A site can have hundreds of tanks: rows out of view skip layout and paint. */
    content-visibility: auto;
    contain-intrinsic-size: auto 9rem;
    border: var(--border-width) solid var(--line);
    border-radius: 0.6rem;
    margin: 0 0 0.6rem;
    background: var(--paper);
  }
  li.row[data-level='danger'],
  li.row[data-level='warning'] {
    border-width: 4px;
    border-color: var(--ink);
  }
  .open {
    width: 100%;
    display: block;
    text-align: left;
    border: 0;
    padding: 0.6rem;
    font-weight: 400;
  }
  .name {
    font-weight: 800;
    font-size: 1.05em;
  }
  .line {
    display: block;
    overflow-wrap: anywhere;
  }
  .muted {
    color: var(--muted);
  }
  .days {
    display: grid;
    gap: 0.25rem;
  }
  .rule,
  .standing {
    font-size: 0.92em;
  }
  .actions {
    display: flex;
    flex-wrap: wrap;
    gap: 0.5rem;
    margin: 0.75rem 0;
  }
  fieldset {
    border: var(--border-width) solid var(--line);
    border-radius: 0.6rem;
    margin: 0 0 0.75rem;
  }
  h2 {
    overflow-wrap: anywhere;
  }
`;
