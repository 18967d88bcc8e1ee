import { inWindow } from '../sets/window';
import { replacementWindow } from './replacement-window';

// Expected values worked by hand from the brief's definition ("Matching"): a new height h matches
// a set within the band when highest − band ≤ h ≤ lowest + band; a replacement must also lie in
// the spec's tolerance band. RB-40 rev B: band 0.0002 in = 0.00508 mm, tolerance 38.08984…38.1 mm
// (1.5000 in +0/−0.0004 in; 1 in = 25.4 mm, NIST SP 811 App. B).
const BAND = 0.00508;
const TOLERANCE = { low: 38.08984, high: 38.1 };

describe('replacementWindow', () => {
  it('cuts the set’s matching range to the tolerance band and centres the window', () => {
    const w = replacementWindow([38.09754, 38.097286, 38.097032, 38.09754], BAND, TOLERANCE, 'mm');
    // [38.09754 − 0.00508, 38.097032 + 0.00508] = [38.09246, 38.102112]; ∩ [38.08984, 38.1].
    expect(w.setWindow).toEqual({ low: 38.09246, high: 38.102112 });
    expect(w.window).toEqual({ low: 38.09246, high: 38.1 });
    expect(w.centre).toBe(38.09623);
    expect(w.explanation).toBe(
      'A replacement must measure 38.0925 mm to 38.1000 mm: within 0.0051 mm of every part of the set, cut to the spec’s tolerance band.',
    );
  });

  it('keeps the matching range whole when it lies inside the tolerance band', () => {
    const w = replacementWindow([38.095, 38.0955], BAND, TOLERANCE, 'in');
    // [38.0955 − 0.00508, 38.095 + 0.00508] = [38.09042, 38.10008] is cut at 38.1 only.
    expect(w.window).toEqual({ low: 38.09042, high: 38.1 });
    const inside = replacementWindow([38.095, 38.0955], BAND, { low: 38.0, high: 38.2 }, 'in');
    expect(inside.window).toEqual({ low: 38.09042, high: 38.10008 });
    expect(inside.centre).toBe(38.09525);
    expect(inside.explanation).toMatch(
      /^A replacement must measure 1\.49962 in to 1\.50000 in: within 0\.00020 in of every part of the set\.$/,
    );
  });

  it('says why there is no window', () => {
    const above = replacementWindow([38.11, 38.111], BAND, TOLERANCE, 'mm');
    // [38.111 − 0.00508, 38.11 + 0.00508] = [38.10592, 38.11508], wholly above 38.1.
    expect(above.setWindow).toEqual({ low: 38.10592, high: 38.11508 });
    expect(above.window).toBeNull();
    expect(above.centre).toBeNull();
    expect(above.explanation).toMatch(/lie entirely above the spec's tolerance band \(38\.0898 mm to 38\.1000 mm\)/);
    const below = replacementWindow([38.08, 38.081], BAND, TOLERANCE, 'mm');
    expect(below.explanation).toMatch(/entirely below/);
    // Spread 0.011 mm > 2 × 0.00508 mm: max − band > min + band, no height matches both ends.
    const wide = replacementWindow([38.09, 38.101], BAND, TOLERANCE, 'mm');
    expect(wide.setWindow).toBeNull();
    expect(wide.explanation).toMatch(/more than twice the matching band/);
  });

  it('counts the window’s limits as inside', () => {
    const window = { low: 38.09246, high: 38.1 };
    expect(inWindow(window, 38.09246)).toBe(true);
    expect(inWindow(window, 38.1)).toBe(true);
    expect(inWindow(window, 38.0924599)).toBe(false);
    expect(inWindow(window, 38.1000001)).toBe(false);
  });
});
