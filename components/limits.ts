/**
 * Length limits of the free text the app keeps, shared by the forms (maxlength) and the backup
 * import check. Generous for real use (a site with its full address, a page of notes) and far
 * below what could stall the list: a 200 000-character site name would scroll the register
 * millions of pixels sideways.
 */
export const TEXT_LIMITS = {
  /** Tank name as the user knows it. */
  name: 80,
  /** Site name and address. */
  site: 160,
  /** Notes on a tank. */
  notes: 2000,
  /** Record ids (ours are 36-character UUIDs or short demo keys). */
  id: 128,
  /** Product ids and labels kept with a check. */
  product: 200,
  /** A caution message or code kept with a saved check. */
  message: 2000,
} as const;

/** Text cut to `max` characters (by code point, so no surrogate pair is split). */
export function clip(text: string, max: number): string {
  const chars = [...text];
  return chars.length <= max ? text : chars.slice(0, max).join('');
}
