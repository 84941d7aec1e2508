/**
 * Hands a text on: the share sheet where there is one, else the clipboard, else the caller shows
 * it to copy by hand. Never throws.
 */
export interface Shared {
  /** What happened, for the status line. */
  status: string;
  /** Neither the share sheet nor the clipboard took it: show the text to copy by hand. */
  byHand: boolean;
}

/** Null when the user closed the share sheet. */
export async function shareText(title: string, text: string): Promise<Shared | null> {
  try {
    if (typeof navigator.share === 'function') {
      await navigator.share({ title, text });
      return { status: 'Summary shared.', byHand: false };
    }
  } catch (e) {
    if (e instanceof DOMException && e.name === 'AbortError') return null;
  }
  try {
    await navigator.clipboard.writeText(text);
    return { status: 'Summary copied. Paste it into a message or a report.', byHand: false };
  } catch {
    return { status: 'Copy the summary below.', byHand: true };
  }
}
