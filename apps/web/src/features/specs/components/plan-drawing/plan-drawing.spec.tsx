import { render, screen } from '@testing-library/react';
import { PlanDrawing } from './plan-drawing';

const plan = {
  stations: [
    { name: 'A', x: -15, y: 15 },
    { name: 'B', x: 15, y: 15 },
    { name: 'C', x: 15, y: -15 },
    { name: 'D', x: -15, y: -15 },
  ],
  datumStations: [
    { name: 'D1', x: -10, y: 0 },
    { name: 'D2', x: 10, y: 0 },
    { name: 'D3', x: 0, y: 10 },
  ],
  runoutCircles: [
    { name: 'OD', radius: 20, positions: 8 },
    { name: 'ID', radius: 8, positions: 4 },
  ],
};

function drawn(container: HTMLElement, kind: string): Element[] {
  return Array.from(container.querySelectorAll(`[data-kind="${kind}"]`));
}

describe('PlanDrawing', () => {
  it('marks every top-face station with its name', () => {
    const { container } = render(<PlanDrawing plan={plan} unit="mm" />);
    const stations = drawn(container, 'station');
    expect(stations).toHaveLength(4);
    expect(stations.map((s) => s.textContent)).toEqual(['A', 'B', 'C', 'D']);
    expect(stations.every((s) => s.querySelector('circle') !== null)).toBe(true);
  });

  it('draws datum stations in another shape than top-face stations', () => {
    const { container } = render(<PlanDrawing plan={plan} unit="mm" />);
    const datum = drawn(container, 'datum-station');
    expect(datum).toHaveLength(3);
    expect(datum.every((d) => d.querySelector('rect') !== null && d.querySelector('circle') === null)).toBe(true);
  });

  it('draws each runout circle with its equally spaced positions', () => {
    const { container } = render(<PlanDrawing plan={plan} unit="mm" />);
    const circles = drawn(container, 'runout-circle');
    expect(circles).toHaveLength(2);
    expect(drawn(circles[0] as HTMLElement, 'runout-position')).toHaveLength(8);
    expect(drawn(circles[1] as HTMLElement, 'runout-position')).toHaveLength(4);
    // The outer circle is drawn larger than the inner one, both on the part's axis.
    const [outer, inner] = circles.map((c) => c.querySelector('circle:not([data-kind])'));
    expect(Number(outer?.getAttribute('r'))).toBeCloseTo(2.5 * Number(inner?.getAttribute('r')), 6);
    expect(outer?.getAttribute('cx')).toBe(inner?.getAttribute('cx'));
  });

  it('places stations by their coordinates, y pointing up', () => {
    const { container } = render(<PlanDrawing plan={plan} unit="mm" />);
    const [a, b, c] = drawn(container, 'station').map((s) => s.querySelector('circle'));
    const x = (el: Element | null | undefined) => Number(el?.getAttribute('cx'));
    const y = (el: Element | null | undefined) => Number(el?.getAttribute('cy'));
    expect(x(b)).toBeGreaterThan(x(a));
    expect(y(b)).toBeCloseTo(y(a), 6);
    // C (y = −15) lies below B (y = +15) on screen.
    expect(y(c)).toBeGreaterThan(y(b));
  });

  it('redraws from half-typed rows, leaving out what cannot be placed yet', () => {
    const { container } = render(
      <PlanDrawing
        plan={{ stations: [{ name: 'A', x: 0, y: 0 }, { name: 'B', x: Number.NaN, y: 2 }, { name: 'C' }] }}
        unit="in"
      />,
    );
    expect(drawn(container, 'station')).toHaveLength(1);
    expect(screen.getByRole('img', { name: /1 top-face station, 0 datum stations, 0 runout circles/ })).toBeTruthy();
  });

  it('invites the engineer to add stations when the plan is empty', () => {
    render(<PlanDrawing plan={{ stations: [] }} unit="in" />);
    expect(screen.getByText('Add stations to see them here')).toBeTruthy();
  });
});
