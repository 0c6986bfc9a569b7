/**
 * Notices tslab's server writes to stderr about the kernel's own traffic — a front end sending a message
 * type tslab does not handle (`history_request`, `usage_request`, a debugger request, ...). They concern
 * the kernel, not the user's cell, so the kernel keeps them out of cell output and in its own log.
 */

/** Whole-write patterns of tslab's notices (tslab 1.0, dist/jupyter.js: `console.warn("unknown msg_type: ...")`). */
const notices: readonly RegExp[] = [/^unknown msg_type: [\w.-]*\r?\n?$/];

/**
 * True when `text` (one write to stderr) is one of tslab's notices about kernel traffic.
 * @example
 * isKernelNotice('unknown msg_type: history_request\n'); // true
 * isKernelNotice('unknown column "x"\n');                // false
 */
export function isKernelNotice(text: string): boolean {
  return notices.some((re) => re.test(text));
}
