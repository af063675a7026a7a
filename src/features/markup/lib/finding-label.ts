import { severityLabels, statusLabels, type Finding } from '../../../../shared/schemas/findings';

type Labelled = Pick<Finding, 'number' | 'title' | 'componentRef' | 'status' | 'severity'>;

/** "3. Leaky coupling capacitor (C27)": how a finding is named in lists and questions. */
export const findingName = (f: Pick<Finding, 'number' | 'title' | 'componentRef'>): string =>
  `${f.number}. ${f.title}${f.componentRef ? ` (${f.componentRef})` : ''}`;

/** The full spoken name, with what the marker shows in colour, glyph and shape put into words. */
export const findingLabel = (f: Labelled): string =>
  `${findingName(f)} — ${statusLabels[f.status]}, ${severityLabels[f.severity].toLowerCase()}`;
