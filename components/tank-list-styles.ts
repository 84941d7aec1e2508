/** Styles of <tank-list> (kept apart so the element's file stays short). */
import { css } from 'lit';

export const tankListStyles = css`
  ul {
    list-style: none;
    margin: 0;
    padding: 0;
  }
  .tank {
    border: var(--border-width) solid var(--line);
    border-radius: 0.6rem;
    margin: 0 0 0.75rem;
    padding: 0.5rem;
    background: var(--paper);
  }
  .open {
    width: 100%;
    display: block;
    text-align: left;
    border: 0;
    padding: 0.5rem;
    min-height: 56px;
  }
  .name {
    font-size: 1.15em;
    font-weight: 800;
    display: block;
  }
  .meta {
    display: block;
    font-weight: 400;
    color: var(--muted);
    overflow-wrap: anywhere;
  }
  .actions {
    display: flex;
    flex-wrap: wrap;
    gap: 0.4rem;
    padding: 0 0.5rem 0.25rem;
  }
  .actions button {
    /* Each button at least as wide as its word: on a narrow phone a row wraps rather than
           cutting "Duplicate" off. */
    flex: 1 1 auto;
    min-width: max-content;
    padding: 0.5rem 0.4rem;
    font-size: 0.9em;
  }
  .walk {
    width: 100%;
    margin: 0 0 0.6rem;
  }
  .site {
    margin: 1.25rem 0 0.5rem;
    font-size: 1.2em;
    overflow-wrap: anywhere;
  }
  .demo-note {
    border: var(--border-width) dashed var(--ink);
    border-radius: 0.5rem;
    padding: 0.6rem;
    margin-bottom: 0.75rem;
  }
  .empty {
    padding: 1rem 0;
  }
  .head {
    display: flex;
    flex-wrap: wrap;
    gap: 0.5rem;
    justify-content: space-between;
    align-items: center;
  }
  .search {
    margin: 0.5rem 0 0.25rem;
  }
  .search input {
    width: 100%;
  }
  .found {
    color: var(--muted);
    margin: 0.25rem 0 0.5rem;
  }
  .rows {
    display: block;
    min-height: 1px;
  }
  .rows > * {
    width: 100%;
  }
  .rows .tank {
    list-style: none;
  }
`;
