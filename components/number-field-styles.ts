/** Styles of `<number-field>`. */
import { css } from 'lit';
import { baseStyles } from './styles.js';

export const numberFieldStyles = [
  baseStyles,
  css`
    :host {
      margin-bottom: 0.75rem;
    }
    .box {
      display: flex;
      align-items: stretch;
      /* A layout boundary: a typed character lays out this box only, not the page. Its height
         is fixed, so it follows the text size (larger text settings) instead of its content. */
      contain: size layout style;
      height: max(48px, calc(1.4em + 1rem + 2 * var(--border-width)));
    }
    input {
      flex: 1 1 auto;
      min-width: 0;
      border-top-right-radius: 0;
      border-bottom-right-radius: 0;
    }
    .unit {
      /* Never shrinks below its text: "US gal" was cut off on a 320 px phone. */
      flex: 0 0 auto;
      display: flex;
      align-items: center;
      padding: 0 0.6rem;
      min-width: 3.2rem;
      border: var(--border-width) solid var(--ink);
      border-left: 0;
      border-radius: 0 0.4rem 0.4rem 0;
      background: var(--paper-2);
      font-weight: 600;
      white-space: nowrap;
    }
    input[aria-invalid='true'] {
      border-color: var(--danger);
      outline: 2px solid var(--danger);
    }
    .hint {
      display: block;
      font-size: 0.9em;
      margin: 0.1rem 0 0.25rem;
    }
    label {
      display: block;
      margin-bottom: 0.2rem;
    }
    .error {
      margin: 0.25rem 0 0;
    }
    .question {
      margin: 0.25rem 0 0;
      font-weight: 600;
    }
    .question button {
      margin-top: 0.3rem;
    }
  `,
];
