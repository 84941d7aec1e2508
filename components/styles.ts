/**
 * Styles shared by the elements. Colours come from CSS custom properties set on the page
 * (index.html), so the outdoor theme is one attribute on <html> and reaches every shadow root.
 * Touch targets are at least 48 CSS px; nothing depends on hover.
 */
import { css } from 'lit';

export const baseStyles = css`
  :host {
    display: block;
    color: var(--ink);
    font: inherit;
  }
  *,
  *::before,
  *::after {
    box-sizing: border-box;
  }
  button,
  .button {
    font: inherit;
    font-weight: 600;
    min-height: 48px;
    min-width: 48px;
    padding: 0.5rem 1rem;
    border: var(--border-width) solid var(--ink);
    border-radius: 0.5rem;
    background: var(--paper);
    color: var(--ink);
    cursor: pointer;
    text-decoration: none;
    display: inline-flex;
    align-items: center;
    justify-content: center;
    gap: 0.4rem;
  }
  button.primary,
  .button.primary {
    background: var(--accent);
    border-color: var(--accent);
    color: var(--on-accent);
  }
  button.quiet {
    border-color: var(--line);
  }
  button:focus-visible,
  .button:focus-visible,
  input:focus-visible,
  select:focus-visible,
  textarea:focus-visible,
  a:focus-visible {
    outline: 3px solid var(--focus);
    outline-offset: 2px;
  }
  button:disabled {
    opacity: 0.55;
    cursor: not-allowed;
  }
  input,
  select,
  textarea {
    font: inherit;
    min-height: 48px;
    width: 100%;
    padding: 0.5rem 0.6rem;
    border: var(--border-width) solid var(--ink);
    border-radius: 0.4rem;
    background: var(--field);
    color: var(--ink);
  }
  label {
    font-weight: 600;
  }
  .row {
    display: flex;
    flex-wrap: wrap;
    gap: 0.5rem;
    align-items: center;
  }
  .muted {
    color: var(--muted);
  }
  .visually-hidden {
    position: absolute;
    width: 1px;
    height: 1px;
    overflow: hidden;
    clip: rect(0 0 0 0);
    white-space: nowrap;
  }
  .error {
    color: var(--danger);
    font-weight: 600;
  }
  fieldset {
    border: var(--border-width) solid var(--line);
    border-radius: 0.5rem;
    padding: 0.75rem;
    margin: 0 0 1rem;
    min-width: 0;
  }
  legend {
    font-weight: 700;
    padding: 0 0.3rem;
  }
  h2,
  h3 {
    margin: 0.5rem 0;
    line-height: 1.25;
  }
  @media print {
    button,
    .no-print {
      display: none !important;
    }
  }
`;

/** Signal-word badges: the word is always printed, so colour never carries meaning alone. */
export const levelStyles = css`
  .level {
    display: inline-block;
    font-weight: 800;
    text-transform: uppercase;
    letter-spacing: 0.03em;
    padding: 0.05rem 0.4rem;
    border-radius: 0.25rem;
    border: 2px solid currentColor;
  }
  .level.danger {
    background: var(--danger);
    color: var(--on-danger);
    border-color: var(--danger);
  }
  .level.warning {
    background: var(--warning);
    color: var(--on-warning);
    border-color: var(--warning);
  }
  .level.caution {
    background: var(--caution);
    color: var(--on-caution);
    border-color: var(--caution);
  }
  .level.notice {
    background: var(--notice);
    color: var(--on-notice);
    border-color: var(--notice);
  }
`;
