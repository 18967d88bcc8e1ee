import { render, screen } from '@testing-library/react';
import { FaceMap } from './face-map';

const flatness = {
  minimumZone: 0.002,
  leastSquares: 0.0015,
  contacts: ['A', 'C', 'D'],
  deviations: [
    { station: 'A', x: -15, y: 15, deviation: 0 },
    { station: 'B', x: 15, y: 15, deviation: 0.001 },
    { station: 'C', x: 15, y: -15, deviation: 0.002 },
    { station: 'D', x: -15, y: -15, deviation: 0 },
  ],
};

describe('FaceMap', () => {
  it('rings the stations that touch the zone and draws the others plain', () => {
    const { container } = render(<FaceMap flatness={flatness} unit="mm" />);
    const contacts = Array.from(container.querySelectorAll('[data-kind="contact"]')).map((g) =>
      g.getAttribute('data-station'),
    );
    const plain = Array.from(container.querySelectorAll('[data-kind="station"]')).map((g) =>
      g.getAttribute('data-station'),
    );
    expect(contacts).toEqual(['A', 'C', 'D']);
    expect(plain).toEqual(['B']);
  });

  it('names the contacts in words and shows the colour scale in the person’s unit', () => {
    render(<FaceMap flatness={flatness} unit="mm" />);
    expect(screen.getByRole('img', { name: /touches A, C, D/ })).toBeInTheDocument();
    expect(screen.getByText('Touches the zone: A, C, D')).toBeInTheDocument();
    expect(screen.getByText('0.0020 mm')).toBeInTheDocument();
  });
});
