type Kind = 'safety-test' | 'safety-override' | 'soak-session' | 'report-sent';
const kinds = new Set<string>(['safety-test', 'safety-override', 'soak-session', 'report-sent']);

/** The history line for a safety event, in words; `alert` marks it red (a failed test, an override, a fault, a premature send). */
export function safetyEventLine(
  kind: string,
  data: Record<string, unknown>,
): { summary: string; alert: boolean } | undefined {
  if (!kinds.has(kind)) return undefined;
  switch (kind as Kind) {
    case 'safety-test':
      return data.verdict === 'pass'
        ? { summary: 'Final safety test recorded: passed', alert: false }
        : { summary: 'Final safety test recorded: not passed', alert: true };
    case 'safety-override':
      return {
        summary: `Returned without a passing safety test, on override: ${String(data.reason ?? '')}`,
        alert: true,
      };
    case 'soak-session': {
      if (data.started === true) return { summary: 'Soak run started', alert: false };
      const hours = typeof data.hours === 'number' ? `${data.hours.toFixed(1)} h` : '';
      return {
        summary:
          `Soak run ${hours}${data.fault ? ': a fault was seen and a finding opened' : ', no fault seen'}`.replace(
            '  ',
            ' ',
          ),
        alert: data.fault === true,
      };
    }
    case 'report-sent': {
      const n = typeof data.warnings === 'number' ? data.warnings : 0;
      return {
        summary: `Hand-back report e-mailed to the owner${n ? ` with ${n} warning${n === 1 ? '' : 's'} shown` : ''}`,
        alert: n > 0,
      };
    }
  }
}
