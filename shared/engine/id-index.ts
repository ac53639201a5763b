/**
 * Position of each id in a list, for documents of many thousands of checks. Two things keep it close to
 * linear in practice as well as in theory: building a V8 Map of 20,000 string keys took 50–100× as long as
 * one of 2,000 in our measurements, and comparing a looked-up id with the stored one would touch the stored
 * string wherever the document put it. So the table is open addressing over an Int32Array, and the ids'
 * characters are copied into one compact pool; lookups never go back to the document.
 */
export class IdIndex {
  /** Pairs (position + 1, hash) per slot, side by side so a probe reads one cache line; 0 marks a free slot. */
  private readonly table: Int32Array;
  private readonly mask: number;
  private pool: Uint16Array;
  private poolLength = 0;
  /** Pairs (start in the pool, length) per position. */
  private readonly spans: Int32Array;

  /** Room for positions 0 … count − 1. */
  constructor(count: number) {
    let capacity = 8;
    while (capacity * 3 < count * 4) capacity *= 2; // at most three quarters full, so probe runs stay short
    this.table = new Int32Array(capacity * 2);
    this.mask = capacity - 1;
    this.pool = new Uint16Array(count * 8 + 16);
    this.spans = new Int32Array(count * 2);
  }

  /** Files `position` under `id`; returns the position already filed under that id (and files nothing), or -1. */
  add(id: string, position: number): number {
    const h = hash(id);
    let slot = h & this.mask;
    for (let held = this.table[slot * 2]; held !== 0; held = this.table[slot * 2]) {
      if (this.table[slot * 2 + 1] === h && this.matches(held - 1, id)) return held - 1;
      slot = (slot + 1) & this.mask;
    }
    if (this.poolLength + id.length > this.pool.length) {
      const larger = new Uint16Array(Math.max(this.pool.length * 2, this.poolLength + id.length));
      larger.set(this.pool);
      this.pool = larger;
    }
    for (let i = 0; i < id.length; i++) this.pool[this.poolLength + i] = id.charCodeAt(i);
    this.spans[position * 2] = this.poolLength;
    this.spans[position * 2 + 1] = id.length;
    this.poolLength += id.length;
    this.table[slot * 2] = position + 1;
    this.table[slot * 2 + 1] = h;
    return -1;
  }

  /** Position of `id`, or -1. */
  get(id: string): number {
    const h = hash(id);
    let slot = h & this.mask;
    for (let held = this.table[slot * 2]; held !== 0; held = this.table[slot * 2]) {
      if (this.table[slot * 2 + 1] === h && this.matches(held - 1, id)) return held - 1;
      slot = (slot + 1) & this.mask;
    }
    return -1;
  }

  private matches(position: number, id: string): boolean {
    if (this.spans[position * 2 + 1] !== id.length) return false;
    const start = this.spans[position * 2];
    for (let i = 0; i < id.length; i++) if (this.pool[start + i] !== id.charCodeAt(i)) return false;
    return true;
  }
}

/** FNV-1a over UTF-16 code units. */
function hash(s: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < s.length; i++) {
    h ^= s.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return h | 0;
}
