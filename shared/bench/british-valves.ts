// British makers' own type names that happen to begin with a European heater letter (U, P, X, H, K) yet follow
// no heater-letter code: read by the European code they would be mistaken for series-heater types. Figures recalled
// from valve data handbooks ('from memory' until checked).
import type { ValveData } from './valve-data';

const MEMORY = 'valve data handbook figures recalled, not checked against published data';

export const BRITISH_VALVES: Readonly<Record<string, ValveData & { base: string }>> = {
  PX4: {
    description: 'directly heated power triode (British type name)',
    heaterVolts: 4,
    heaterAmps: 1,
    base: 'British 4-pin',
    equivalents: [],
    confidence: 'from memory',
    source: MEMORY,
  },
  PX25: {
    description: 'directly heated power triode (British type name)',
    heaterVolts: 4,
    heaterAmps: 2,
    base: 'British 4-pin',
    equivalents: [],
    confidence: 'from memory',
    source: MEMORY,
  },
  U52: {
    description: 'directly heated full-wave rectifier (British type name)',
    heaterVolts: 5,
    heaterAmps: 3,
    base: 'international octal',
    equivalents: [],
    confidence: 'from memory',
    source: MEMORY,
  },
  U50: {
    description: 'directly heated full-wave rectifier (British type name)',
    heaterVolts: 5,
    heaterAmps: 2,
    base: 'international octal',
    equivalents: [],
    confidence: 'from memory',
    source: MEMORY,
  },
  X65: {
    description: 'triode-hexode frequency changer (British type name)',
    heaterVolts: 6.3,
    heaterAmps: 0.3,
    base: 'international octal',
    equivalents: [],
    confidence: 'from memory',
    source: MEMORY,
  },
  H63: {
    description: 'high-µ triode (British type name)',
    heaterVolts: 6.3,
    heaterAmps: 0.3,
    base: 'international octal',
    equivalents: [],
    confidence: 'from memory',
    source: MEMORY,
  },
  HL23: {
    description: 'battery triode (British type name)',
    heaterVolts: 2,
    heaterAmps: 0.05,
    base: 'British 4-pin',
    equivalents: [],
    confidence: 'from memory',
    source: MEMORY,
  },
  KT66: {
    description: 'beam power output valve (British type name)',
    heaterVolts: 6.3,
    heaterAmps: 1.27,
    base: 'international octal',
    equivalents: [],
    confidence: 'from memory',
    source: MEMORY,
  },
  KT61: {
    description: 'output tetrode (British type name)',
    heaterVolts: 6.3,
    heaterAmps: 0.95,
    base: 'international octal',
    equivalents: [],
    confidence: 'from memory',
    source: MEMORY,
  },
};
