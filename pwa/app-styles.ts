/** The shell's styles: the header with the main navigation, the screen area and the notices. */
import { css } from 'lit';
import { baseStyles } from '../components/styles.js';

export const appStyles = [
  baseStyles,
  css`
    :host {
      display: block;
      min-height: 100vh;
    }
    header {
      background: var(--ink);
      color: var(--paper);
      padding: 0.25rem 0.5rem 0.4rem;
      display: flex;
      flex-wrap: wrap;
      align-items: center;
      gap: 0.25rem 0.75rem;
    }
    header .brand {
      margin: 0;
      font-weight: 800;
      font-size: 1.05rem;
      flex: 1 1 auto;
    }
    nav {
      display: grid;
      grid-template-columns: repeat(3, minmax(0, 1fr));
      gap: 0.25rem;
      flex: 1 1 18rem;
    }
    nav a.button {
      color: var(--paper);
      border-color: var(--paper);
      background: transparent;
      padding: 0.5rem 0.3rem;
    }
    nav a.button[aria-current='page'] {
      background: var(--paper);
      color: var(--ink);
    }
    main {
      padding: 0.75rem;
      max-width: 72rem;
      margin: 0 auto;
      outline: none;
    }
    .notices {
      position: sticky;
      bottom: 0;
      padding: 0.5rem;
      display: grid;
      gap: 0.5rem;
      max-width: 72rem;
      margin: 0 auto;
      z-index: 10;
    }
    @media print {
      header,
      .notices {
        display: none;
      }
      main {
        padding: 0;
      }
    }
  `,
];
