/** A plan as it stands while being typed: any number may still be missing or unreadable. */
export interface DraftPoint {
  name?: string | undefined;
  x?: number | undefined;
  y?: number | undefined;
}
export interface DraftCircle {
  name?: string | undefined;
  radius?: number | undefined;
  positions?: number | undefined;
}
export interface DraftPlan {
  stations?: readonly DraftPoint[] | undefined;
  datumStations?: readonly DraftPoint[] | undefined;
  runoutCircles?: readonly DraftCircle[] | undefined;
}

export interface PlacedPoint {
  name: string;
  x: number;
  y: number;
}
export interface PlacedCircle {
  name: string;
  radius: number;
  /** The equally spaced positions, starting on the +x axis and going counter-clockwise. */
  positions: { x: number; y: number }[];
}

const finite = (value: number | undefined): value is number => typeof value === 'number' && Number.isFinite(value);

/** The points that can be drawn: both coordinates readable. */
export function placedPoints(points: readonly DraftPoint[] | undefined): PlacedPoint[] {
  return (points ?? []).flatMap((p) => (finite(p.x) && finite(p.y) ? [{ name: p.name ?? '', x: p.x, y: p.y }] : []));
}

/** The circles that can be drawn, centred on the part's axis (0, 0). */
export function placedCircles(circles: readonly DraftCircle[] | undefined): PlacedCircle[] {
  return (circles ?? []).flatMap((c) => {
    if (!finite(c.radius) || c.radius <= 0) return [];
    const radius = c.radius;
    const count =
      finite(c.positions) && Number.isInteger(c.positions) && c.positions >= 1 && c.positions <= 360 ? c.positions : 0;
    const positions = Array.from({ length: count }, (_, k) => {
      const angle = (2 * Math.PI * k) / count;
      return { x: radius * Math.cos(angle), y: radius * Math.sin(angle) };
    });
    return [{ name: c.name ?? '', radius, positions }];
  });
}

export interface Extent {
  minX: number;
  maxX: number;
  minY: number;
  maxY: number;
}

/** The area to draw: every point and circle, the axis at (0, 0), and a margin. */
export function planExtent(points: readonly PlacedPoint[], circles: readonly PlacedCircle[]): Extent {
  const xs = [0, ...points.map((p) => p.x), ...circles.flatMap((c) => [-c.radius, c.radius])];
  const ys = [0, ...points.map((p) => p.y), ...circles.flatMap((c) => [-c.radius, c.radius])];
  const [minX, maxX, minY, maxY] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const span = Math.max(maxX - minX, maxY - minY) || 1;
  const margin = span * 0.12;
  return { minX: minX - margin, maxX: maxX + margin, minY: minY - margin, maxY: maxY + margin };
}

/** A round step for about `count` ticks over `span`: 1, 2 or 5 times a power of ten. */
export function tickStep(span: number, count = 6): number {
  const raw = span / count;
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= raw);
  return step ?? 10 * power;
}

/** Tick values from `min` to `max` at multiples of `step`. */
export function ticks(min: number, max: number, step: number): number[] {
  const first = Math.ceil(min / step);
  const last = Math.floor(max / step);
  return Array.from({ length: Math.max(0, last - first + 1) }, (_, i) => Number(((first + i) * step).toPrecision(12)));
}
