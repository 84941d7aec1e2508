/** Saving text as a file on the device, and the date stamp in the file names. */

/** The day of `d` as YYYY-MM-DD (UTC), for file names. */
export function stamp(d = new Date()): string {
  return d.toISOString().slice(0, 10);
}

/** Saves text as a file through a temporary link (no network involved). */
export function download(name: string, type: string, text: string): void {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  a.rel = 'noopener';
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
