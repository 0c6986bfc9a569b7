/**
 * The shapes that travel from notebook code to a front end: a mime bundle (one entry per
 * representation) and a display message in the Jupyter messaging protocol's `display_data` /
 * `update_display_data` content form.
 */

/** Mime type → representation. JSON mime types (`application/...+json`) hold objects, not strings. */
export type MimeBundle = Record<string, unknown>;

/** Content of a `display_data` or `update_display_data` message. */
export interface DisplayMessage {
  readonly data: MimeBundle;
  readonly metadata: Record<string, unknown>;
  /** `display_id` lets a later message replace this output in place. */
  readonly transient: { readonly display_id?: string };
}

/** Where cell output goes: the kernel's iopub, a headless runner's notebook, or a test. */
export interface OutputHooks {
  /** A rich output. `update` is true when it replaces the output with the same display id. */
  onDisplay?(message: DisplayMessage, update: boolean): void;
  /** Text written to stdout or stderr while a cell runs. */
  onStream?(name: 'stdout' | 'stderr', text: string): void;
}
