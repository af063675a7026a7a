import { describe, expect, it } from 'vitest';
import { heaterChain } from './index';
import { expectRelative } from './bench-test-support';

// Heater figures per type as recalled from valve data handbooks (from memory); the chain arithmetic is Ohm's law,
// each expected value worked by hand.

describe('heaterChain', () => {
  it('when the five-valve Rimlock 100 mA line-up runs on 220 V, then it needs about 1.03 kΩ dropping 10.3 W', () => {
    // from memory: UCH42 14 V + UAF42 12.6 V + UBC41 14 V + UL41 45 V + UY41 31 V = 116.6 V at 100 mA
    const chain = heaterChain({ valves: ['UCH42', 'UAF42', 'UBC41', 'UL41', 'UY41'], mainsVolts: 220 });
    expectRelative(chain.volts, 116.6);
    expect(chain.amps).toBe(0.1);
    expectRelative(chain.dropperOhms, 1034); // by hand: (220 − 116.6) / 0.1
    expectRelative(chain.dropperWatts, 10.34); // by hand: 103.4 V × 0.1 A
    expect(chain.mixedCurrents).toBe(false);
  });

  it('when the same line-up runs on 240 V, then the dropper grows to 1.234 kΩ and 12.34 W', () => {
    const chain = heaterChain({ valves: ['UCH42', 'UAF42', 'UBC41', 'UL41', 'UY41'], mainsVolts: 240 });
    expectRelative(chain.dropperOhms, 1234); // by hand: (240 − 116.6) / 0.1
    expectRelative(chain.dropperWatts, 12.34); // by hand
  });

  it('when the American five-valve 150 mA line-up adds up to more than 120 V mains, then no dropper is needed', () => {
    // from memory: 12BE6, 12BA6, 12AV6 at 12.6 V, 50C5 at 50 V, 35W4 at 35 V, all 150 mA: 122.8 V, straight across the mains
    const chain = heaterChain({ valves: ['12BE6', '12BA6', '12AV6', '50C5', '35W4'], mainsVolts: 120 });
    expectRelative(chain.volts, 122.8);
    expect(chain.amps).toBe(0.15);
    expect(chain.dropperOhms).toBe(0);
  });

  it('when a 300 mA valve is put in a 100 mA string, then the currents are flagged as mixed', () => {
    // from memory: ECH81 heater 0.3 A, UCH42 0.1 A; mixing them in series is an error (common practice, no source)
    expect(heaterChain({ valves: ['UCH42', 'UAF42', 'ECH81'], mainsVolts: 230 }).mixedCurrents).toBe(true);
  });

  it('when a 50 mA dial lamp sits in a 100 mA string, then its shunt carries the other 50 mA', () => {
    // by hand: R = 6.3 V / (0.1 − 0.05) A = 126 Ω; the lamp's 6.3 V joins the heater total
    const chain = heaterChain({
      valves: ['UCH42', 'UAF42', 'UBC41', 'UL41', 'UY41'],
      mainsVolts: 220,
      dialLamp: { volts: 6.3, amps: 0.05 },
    });
    expectRelative(chain.lampShuntOhms!, 126);
    expectRelative(chain.volts, 122.9);
  });

  it('when a name cannot be read, then it is reported rather than ignored', () => {
    const chain = heaterChain({ valves: ['UCH42', 'ZZ99', 'UCL82'], mainsVolts: 220 });
    expect(chain.unknown).toEqual(['ZZ99', 'UCL82']); // UCL82 decodes (U = 100 mA) but its heater volts are not in the table
    expectRelative(chain.volts, 14); // from memory: UCH42 alone, 14 V
  });
});
