/** DOM helpers for the component tests: find elements through nested open shadow roots. */

/** The first element matching `selector` in `root` or any shadow root below it. */
export function deep(root: Element | ShadowRoot | Document, selector: string): HTMLElement | null {
  if (root instanceof Element && root.shadowRoot) return deep(root.shadowRoot, selector);
  const direct = root.querySelector<HTMLElement>(selector);
  if (direct) return direct;
  for (const el of root.querySelectorAll('*')) {
    if (el.shadowRoot) {
      const hit = deep(el.shadowRoot, selector);
      if (hit) return hit;
    }
  }
  return null;
}

/** Every element matching `selector` in `root` and the shadow roots below it. */
export function deepAll(root: Element | ShadowRoot | Document, selector: string): HTMLElement[] {
  if (root instanceof Element && root.shadowRoot) return deepAll(root.shadowRoot, selector);
  const out = [...root.querySelectorAll<HTMLElement>(selector)];
  for (const el of root.querySelectorAll('*'))
    if (el.shadowRoot) out.push(...deepAll(el.shadowRoot, selector));
  return out;
}

/** The element with `data-testid="id"` inside `el` (through shadow roots); throws if absent. */
export function byTestId(el: Element, id: string): HTMLElement {
  const hit = deep(el, `[data-testid="${id}"]`);
  if (!hit) throw new Error(`no [data-testid="${id}"]`);
  return hit;
}

/** Types text into an input as a user would (sets the value and fires `input`). */
export function typeText(input: HTMLInputElement | HTMLTextAreaElement, text: string): void {
  input.value = text;
  input.dispatchEvent(new Event('input', { bubbles: true, composed: true }));
}

/** Waits for every lit element under `root` to finish updating. */
export async function settleAll(root: Element | ShadowRoot): Promise<void> {
  for (let i = 0; i < 3; i++) {
    const all = deepAll(root, '*') as unknown as { updateComplete?: Promise<unknown> }[];
    await Promise.all(all.map((e) => e.updateComplete).filter(Boolean));
  }
}

/** Selector of a <number-field>'s error message (inside its shadow root). */
export const FIELD_ERROR = '.error[id$="-err"]';
