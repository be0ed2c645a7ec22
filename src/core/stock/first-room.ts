// The free room of open stock pieces, in order of opening, kept in a max
// segment tree: the first piece with at least a given room is found in
// O(log n) rather than by a scan, so first-fit stays fast at a hundred
// thousand pieces.

export class FirstRoom {
  private readonly tree: Float64Array;
  private readonly leaves: number;
  private count = 0;

  /** Room for at most `capacity` stock pieces. */
  constructor(capacity: number) {
    let leaves = 1;
    while (leaves < Math.max(1, capacity)) leaves *= 2;
    this.leaves = leaves;
    this.tree = new Float64Array(2 * leaves).fill(-Infinity);
  }

  get length(): number {
    return this.count;
  }

  /** Open a piece with this much room; its index. */
  push(room: number): number {
    this.set(this.count, room);
    return this.count++;
  }

  set(i: number, room: number): void {
    let k = i + this.leaves;
    this.tree[k] = room;
    for (k >>= 1; k >= 1; k >>= 1) this.tree[k] = Math.max(this.tree[2 * k], this.tree[2 * k + 1]);
  }

  get(i: number): number {
    return this.tree[i + this.leaves];
  }

  /** The first piece with at least `room`, or -1. */
  first(room: number): number {
    if (this.tree[1] < room) return -1;
    let k = 1;
    while (k < this.leaves) k = this.tree[2 * k] >= room ? 2 * k : 2 * k + 1;
    return k - this.leaves;
  }
}
