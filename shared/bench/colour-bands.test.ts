import { describe, expect, it } from 'vitest';
import { BenchInputError, colourBands, resistorBands } from './index';
import { expectRelative } from './bench-test-support';

// Colour meanings per IEC 60062 (colour-code summary pages: kodekata.net, instrumentationtools.com, elektropage.com):
// digits black 0 … white 9; multipliers gold ×0.1, silver ×0.01; tolerances brown ±1 %,
// red ±2 %, gold ±5 %, silver ±10 %, no band ±20 %.

describe('colourBands decodes four-band resistors', () => {
  it('reads yellow violet red gold as 4.7 kΩ ±5 %', () => {
    const r = colourBands(['yellow', 'violet', 'red', 'gold']);
    expectRelative(r.ohms, 4700); // IEC 60062: 4, 7, ×100
    expectRelative(r.tolerance, 0.05); // IEC 60062: gold ±5 %
  });

  it('reads red red gold gold as 2.2 Ω, gold as a multiplier', () => {
    expectRelative(colourBands(['red', 'red', 'gold', 'gold']).ohms, 2.2); // IEC 60062: gold multiplier ×0.1
  });

  it('reads brown black silver silver as 0.1 Ω ±10 %', () => {
    const r = colourBands(['brown', 'black', 'silver', 'silver']);
    expectRelative(r.ohms, 0.1); // IEC 60062: silver multiplier ×0.01
    expectRelative(r.tolerance, 0.1); // IEC 60062: silver ±10 %
  });
});

describe('colourBands decodes three-, five- and six-band resistors', () => {
  it('gives a three-band part ±20 %', () => {
    const r = colourBands(['brown', 'black', 'orange']);
    expectRelative(r.ohms, 10e3); // IEC 60062: 1, 0, ×1000
    expectRelative(r.tolerance, 0.2); // IEC 60062: no tolerance band = ±20 % (M)
  });

  it('reads a five-band brown black black red brown as 10 kΩ ±1 %', () => {
    const r = colourBands(['brown', 'black', 'black', 'red', 'brown']);
    expectRelative(r.ohms, 10e3); // IEC 60062: 1, 0, 0, ×100
    expectRelative(r.tolerance, 0.01); // IEC 60062: brown ±1 %
    expect(r.tempcoPpm).toBeUndefined(); // IEC 60062: only the sixth band gives a tempco
  });

  it('reads green blue black black brown as 560 Ω', () => {
    expectRelative(colourBands(['green', 'blue', 'black', 'black', 'brown']).ohms, 560); // IEC 60062: 5, 6, 0, ×1
  });

  it('returns the temperature coefficient from a sixth band', () => {
    const r = colourBands(['brown', 'black', 'black', 'red', 'red', 'red']);
    expectRelative(r.ohms, 10e3); // IEC 60062
    expectRelative(r.tolerance, 0.02); // IEC 60062: red ±2 %
    expect(r.tempcoPpm).toBe(50); // from memory: IEC 60062:2016 tempco band red = 50 ppm/K
  });
});

describe('colourBands accepts spelling variants', () => {
  it('treats gray as grey and ignores case', () => {
    expectRelative(colourBands(['Gray', 'RED', 'brown']).ohms, 820); // IEC 60062: 8, 2, ×10
    expect(colourBands(['gray', 'red', 'brown'])).toEqual(colourBands(['grey', 'red', 'brown'])); // same colour, two spellings
  });

  it('treats purple as violet', () => {
    expectRelative(colourBands(['purple', 'green', 'black']).ohms, 75); // IEC 60062: violet = 7
  });
});

describe('colourBands refuses colours that mean nothing in their position', () => {
  it('refuses gold as a first digit and suggests reading from the other end', () => {
    expect(() => colourBands(['gold', 'red', 'violet', 'yellow'])).toThrow(
      /Band 1 is gold.*read the resistor from the other end/,
    ); // IEC 60062: gold has no digit
  });

  it('refuses white as a tolerance band', () => {
    expect(() => colourBands(['red', 'red', 'red', 'white'])).toThrow(
      /Band 4 is white, which has no meaning as a tolerance band/,
    ); // IEC 60062: white has no tolerance
  });

  it('refuses a colour that is not in the code', () => {
    expect(() => colourBands(['puce', 'red', 'red'])).toThrow(/'puce' \(band 1\) is not a colour/); // IEC 60062 colour list
  });

  it('refuses a two-band code', () => {
    expect(() => colourBands(['red', 'red'])).toThrow(/3, 4, 5 or 6 bands; got 2/); // IEC 60062: 3 to 6 bands
  });
});

describe('resistor colour bands', () => {
  // IEC 60062 colour code: digits black 0 … white 9; multiplier by the same colours
  // (gold ×0.1, silver ×0.01); tolerance gold ±5 %, silver ±10 %, no band ±20 %.
  it('when a value is 150 Ω, then it reads brown green brown gold', () => {
    expect(resistorBands(150)).toEqual(['brown', 'green', 'brown', 'gold']);
  });

  it('when a value is 1 MΩ, then it reads brown black green gold', () => {
    expect(resistorBands(1e6)).toEqual(['brown', 'black', 'green', 'gold']);
  });

  it('when a value is 47 kΩ, then it reads yellow violet orange gold', () => {
    expect(resistorBands(47e3)).toEqual(['yellow', 'violet', 'orange', 'gold']);
  });

  it('when values sit at the ends of the scale, then the multiplier band follows', () => {
    expect(resistorBands(220e3)).toEqual(['red', 'red', 'yellow', 'gold']);
    expect(resistorBands(2.2e3)).toEqual(['red', 'red', 'red', 'gold']);
    expect(resistorBands(4.7)).toEqual(['yellow', 'violet', 'gold', 'gold']);
    expect(resistorBands(470e3, 0.1)).toEqual(['yellow', 'violet', 'yellow', 'silver']);
    expect(resistorBands(10e3, 0.2)).toEqual(['brown', 'black', 'orange']);
  });

  it('when bands are written for a value, then the decoder reads the same value back', () => {
    // Round trip through the one IEC 60062 table: encoder and decoder cannot disagree.
    for (const ohms of [4.7, 10, 150, 2.2e3, 47e3, 470e3, 1e6])
      expect(colourBands(resistorBands(ohms)).ohms).toBeCloseTo(ohms, 9);
    expect(colourBands(resistorBands(470e3, 0.1)).tolerance).toBe(0.1);
  });

  it('when a value needs three significant digits, then it is refused', () => {
    expect(() => resistorBands(1234)).toThrow(BenchInputError);
    expect(() => resistorBands(0)).toThrow(BenchInputError);
  });
});
