/** Styles of <check-results> (kept apart so the element's file stays short). */
import { css } from 'lit';

export const checkResultsStyles = css`
  .key {
    display: grid;
    grid-template-columns: repeat(auto-fit, minmax(14rem, 1fr));
    gap: 0.75rem;
    margin-bottom: 1rem;
  }
  .card {
    border: var(--border-width) solid var(--ink);
    border-radius: 0.6rem;
    padding: 0.75rem;
    background: var(--paper);
    min-width: 0;
  }
  .card h3 {
    font-size: 1rem;
    margin: 0 0 0.25rem;
  }
  .big {
    font-size: 1.6em;
    font-weight: 800;
    line-height: 1.2;
    overflow-wrap: anywhere;
  }
  dl {
    margin: 0;
    display: grid;
    /* A long figure ("exceeded by 1234 psi", a blend's composition) wraps inside its own
           column instead of running over the label. */
    grid-template-columns: minmax(0, 1fr) fit-content(55%);
    gap: 0.25rem 0.75rem;
  }
  dt,
  dd {
    min-width: 0;
    overflow-wrap: anywhere;
  }
  dd {
    margin: 0;
    font-weight: 700;
    text-align: right;
    font-variant-numeric: tabular-nums;
  }
  .act {
    font-size: 0.92em;
    font-weight: 400;
    text-align: left;
    grid-column: 1 / -1;
    margin: 0 0 0.25rem;
  }
  .standing {
    border: var(--border-width) solid var(--ink);
    border-left-width: 0.6rem;
    border-radius: 0.4rem;
    padding: 0.4rem 0.75rem;
    margin: 0 0 1rem;
    background: var(--paper-2);
  }
  .standing summary {
    cursor: pointer;
    min-height: 48px;
    padding: 0.25rem 0;
  }
  .standing summary .more {
    text-decoration: underline;
    white-space: nowrap;
  }
  .standing p {
    margin: 0.25rem 0 0.25rem;
  }
  .cautions {
    list-style: none;
    padding: 0;
    margin: 0 0 1rem;
  }
  .cautions li {
    border: var(--border-width) solid var(--line);
    border-radius: 0.4rem;
    padding: 0.5rem 0.6rem;
    margin-bottom: 0.5rem;
    background: var(--paper);
  }
  .cautions li .level {
    margin-right: 0.4rem;
  }
  .over {
    color: var(--danger);
  }
  .note {
    font-size: 0.92em;
  }
  section {
    margin-bottom: 1rem;
  }
  /* While the user types at the top of a phone screen, the cards and sections below it are
     off screen: the browser then neither lays them out nor paints them (their last size is kept,
     so the page does not jump), which keeps a keystroke's frame short. Their text stays in the
     page for screen readers and find-in-page; print shows them all. */
  .card,
  section {
    content-visibility: auto;
    contain-intrinsic-block-size: auto 12rem;
  }
  .missing {
    border: var(--border-width) dashed var(--ink);
    border-radius: 0.5rem;
    padding: 0.75rem;
    margin-bottom: 1rem;
  }
  @media print {
    .card,
    .cautions li,
    .standing {
      break-inside: avoid;
    }
    .card,
    section {
      content-visibility: visible;
    }
  }
`;
