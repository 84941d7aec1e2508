/** Styles of <check-screen> (kept apart so the element's file stays short). */
import { css } from 'lit';

export const checkScreenStyles = css`
  .head {
    display: flex;
    flex-wrap: wrap;
    align-items: center;
    gap: 0 0.5rem;
    margin-bottom: 0.5rem;
  }
  .head h2 {
    flex: 1 1 12rem;
    font-size: 1.15rem;
    margin: 0;
    overflow-wrap: anywhere;
  }
  .plate {
    flex: 1 1 100%;
    color: var(--muted);
    font-size: 0.85em;
    margin: 0.2rem 0 0;
    overflow-wrap: anywhere;
  }
  .layout > * + * {
    margin-top: 1rem;
  }
  @media (min-width: 60rem) {
    .layout {
      display: grid;
      gap: 1rem;
      grid-template-columns: minmax(18rem, 26rem) minmax(0, 1fr);
      align-items: start;
    }
    .layout > * + * {
      margin-top: 0;
    }
  }
  .actions {
    display: flex;
    flex-wrap: wrap;
    gap: 0.5rem;
    margin: 0.5rem 0 1rem;
  }
  .actions button {
    flex: 1 1 8rem;
  }
  .status {
    min-height: 1.5em;
    font-weight: 700;
  }
  textarea {
    min-height: 10rem;
  }
  .updating {
    position: absolute;
    right: 0.75rem;
    bottom: -1.4rem;
    margin: 0;
    padding: 0 0.4rem;
    font-size: 0.8rem;
    border-radius: 0.25rem;
    background: var(--paper);
    color: var(--ink);
  }
  .keybar {
    position: sticky;
    top: 0;
    z-index: 5;
    margin: 0 -0.75rem 0.75rem;
  }
  .stale {
    border: var(--border-width) dashed var(--ink);
    border-radius: 0.5rem;
    padding: 0.5rem 0.75rem;
    margin: 0 0 0.75rem;
    font-weight: 700;
    background: var(--paper-2);
  }
  /* Off screen while the readings are typed: skipped in layout and paint (see
     check-results-styles.ts). */
  check-chart,
  check-history,
  fill-history {
    display: block;
    content-visibility: auto;
    contain-intrinsic-block-size: auto 16rem;
  }
  .print-only {
    display: none;
  }
  @media print {
    .print-only {
      display: block;
    }
  }
  @media print {
    .layout {
      display: block;
    }
    check-form,
    check-history,
    .actions,
    .keybar {
      display: none;
    }
    check-chart,
    fill-history {
      content-visibility: visible;
    }
  }
`;
