/**
 * The core's messages in the user's words. The core names what it refused by its internal path
 * (`glazing.shgc = 1.4 is not allowed: must be a number from 0 to 1`); the pane names it by what the
 * user sees — the box's label, the table column, the option — and keeps the rest of the message:
 * `SHGC at normal incidence: 1.4 is not allowed: must be a number from 0 to 1`.
 */

/** `path = …` or `path[k] = …` at the start of a core message. */
const PREFIX = /^([A-Za-z_][\w.]*)(?:\[(\d+)\])? = ([\s\S]*)$/;

/**
 * What a core message says after the argument's path: `1.4 is not allowed: …`; an item of a list
 * is named by its place (`value 6: 30 is not allowed: …`). A message without a path is returned as it is.
 */
export function withoutPath(message: string): string {
  const m = PREFIX.exec(message);
  if (!m) return message;
  return m[2] !== undefined ? `value ${Number(m[2]) + 1}: ${m[3]}` : m[3];
}

/** A core message under the name the user knows: `SHGC at normal incidence: 1.4 is not allowed: …`. */
export function inUserWords(message: string, name: string): string {
  const m = PREFIX.exec(message);
  if (!m) return message;
  return m[2] !== undefined ? `${name}, value ${Number(m[2]) + 1}: ${m[3]}` : `${name}: ${m[3]}`;
}
