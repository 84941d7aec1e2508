/** Styles of `<tank-form>`. */
import { css } from 'lit';
import { baseStyles } from './styles.js';

export const tankFormStyles = [
  baseStyles,
  css`
    form {
      max-width: 40rem;
    }
    .field {
      margin-bottom: 0.75rem;
    }
    .field label {
      display: block;
      margin-bottom: 0.2rem;
    }
    .check {
      display: flex;
      align-items: center;
      gap: 0.6rem;
      min-height: 48px;
      font-weight: 600;
    }
    .check input {
      width: 28px;
      height: 28px;
      min-height: 28px;
      flex: none;
    }
    .hint {
      display: block;
      font-size: 0.9em;
      font-weight: 400;
    }
    .buttons {
      display: flex;
      flex-wrap: wrap;
      gap: 0.5rem;
      margin-top: 1rem;
    }
    .buttons button {
      flex: 1 1 8rem;
    }
  `,
];
