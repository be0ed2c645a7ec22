// The inner edge of the floor frame in plan, mm: x = 0 (rear) to depth (front),
// y = -width/2 (right) to +width/2 (left). A steam-bent front rail rounds the
// two front corners; the inner face's radius is the centre-line radius less
// half the rail width.

export type Rail = 'front' | 'rear' | 'left' | 'right';

export class FloorOutline {
  /** Inner-face radius of the two front corners, mm (0: square corners). */
  readonly cornerRadius: number;
  constructor(
    readonly depth: number,
    readonly width: number,
    centreLineRadius = 0,
    railWidth = 0,
  ) {
    this.cornerRadius = Math.min(Math.max(0, centreLineRadius - railWidth / 2), depth, width / 2);
  }

  /** Half the clear width at distance x from the rear. */
  halfWidthAt(x: number): number {
    const r = this.cornerRadius;
    const dx = x - (this.depth - r);
    if (dx <= 0) return this.width / 2;
    return this.width / 2 - r + Math.sqrt(Math.max(0, r * r - dx * dx));
  }

  /** The front edge's x at lateral position y. */
  frontAt(y: number): number {
    const r = this.cornerRadius;
    const dy = Math.abs(y) - (this.width / 2 - r);
    if (dy <= 0) return this.depth;
    return this.depth - r + Math.sqrt(Math.max(0, r * r - dy * dy));
  }

  /** Strictly inside the clear floor (both tests, so a crossing is on both of its straps or neither). */
  inside(x: number, y: number): boolean {
    return x > 0 && x < this.frontAt(y) && Math.abs(y) < this.halfWidthAt(x);
  }
}
