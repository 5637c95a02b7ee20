/**
 * Things a run should tell its user that are not errors (a font package that would
 * print more of a name), gathered by the renderers and written by the command line
 * once the command has run: the library itself never writes to the terminal. Each
 * notice is kept once, however often it is met.
 */
const notices = new Set<string>();

/** Records a notice (once per run). */
export function addNotice(text: string): void {
  notices.add(text);
}

/** The notices recorded so far, in the order first met; the list is emptied. */
export function takeNotices(): string[] {
  const out = [...notices];
  notices.clear();
  return out;
}
