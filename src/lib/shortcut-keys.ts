/** The parts of a key press that shortcuts look at (the same on a DOM KeyboardEvent). */
export interface KeyPress {
  key: string;
  ctrlKey: boolean;
  metaKey: boolean;
  shiftKey: boolean;
  altKey: boolean;
}

/** What the key press landed on, as far as shortcuts care. */
export interface KeyTarget {
  /** A focused area that scrolls sideways (e.g. a diagram) keeps ← and → for scrolling. */
  scrollsSideways: boolean;
}

/** Names the shortcut a key press is, or null when it is none. */
export type KeyResolver<K extends string> = (press: KeyPress, target: KeyTarget) => K | null;
