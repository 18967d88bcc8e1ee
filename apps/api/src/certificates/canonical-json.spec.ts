import { canonicalJson } from './canonical-json';

describe('canonical JSON of certificate facts', () => {
  it('sorts keys at every depth and writes no whitespace', () => {
    expect(canonicalJson({ b: [{ z: 1, a: 'x' }], a: { d: null, c: true } })).toBe(
      '{"a":{"c":true,"d":null},"b":[{"a":"x","z":1}]}',
    );
  });

  it('escapes strings as JSON does, so the text parses back to the same value (ECMA-404)', () => {
    const value = { text: 'Harbor "Tool" & Die\n±0.0002 in — ok', n: 4 };
    expect(JSON.parse(canonicalJson(value))).toEqual(value);
  });

  it('refuses fractional numbers: lengths must be strings', () => {
    expect(() => canonicalJson({ height: 1.4998 })).toThrow(/lengths are strings/);
  });
});
