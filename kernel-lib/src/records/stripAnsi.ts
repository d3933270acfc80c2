/** Removes terminal colour and cursor codes (ESC [ ... letter) from text shown in records. */
// eslint-disable-next-line no-control-regex -- matching the ESC control character is the point
const ANSI_SEQUENCE = /\u001b\[[0-9;?]*[A-Za-z]/g;

export function stripAnsi(text: string): string {
  return text.replace(ANSI_SEQUENCE, "");
}
