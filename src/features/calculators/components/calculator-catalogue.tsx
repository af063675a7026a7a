import type { ReactNode } from 'react';
import { AlignmentCard } from './alignment-card';
import { BypassCornerCard } from './bypass-corner-card';
import { CapacitorCodeCard } from './capacitor-code-card';
import { CathodeBiasCard } from './cathode-bias-card';
import { CathodeCurrentCard } from './cathode-current-card';
import { ColourBandsCard } from './colour-bands-card';
import { DischargeCard } from './discharge-card';
import { EsrCard } from './esr-card';
import { HeaterChainCard } from './heater-chain-card';
import { LeakageCard } from './leakage-card';
import { LiveChassisCard } from './live-chassis-card';
import { MeterLoadingCard } from './meter-loading-card';
import { PreferredValueCard } from './preferred-value-card';
import { RcCornerCard } from './rc-corner-card';
import { ReadingVerdictCard } from './reading-verdict-card';
import { ResistorDissipationCard } from './resistor-dissipation-card';
import { SeriesLampCard } from './series-lamp-card';
import { TapScalingCard } from './tap-scaling-card';
import { TimeConstantCard } from './time-constant-card';
import { ValueReaderCard } from './value-reader-card';
import { ValveDecoderCard } from './valve-decoder-card';
import { ValveRatingsCard } from './valve-ratings-card';

/** One calculator in the index: its card's title, words a restorer might search for, and the card. */
export interface CatalogueEntry {
  title: string;
  keywords: string;
  card: ReactNode;
}

export const calculatorCatalogue: { title: string; entries: CatalogueEntry[] }[] = [
  {
    title: 'Reading parts',
    entries: [
      { title: 'Value reader', keywords: 'marking resistor capacitor prefix 2k2 330R', card: <ValueReaderCard /> },
      { title: 'Capacitor code', keywords: 'three digit code 104 ceramic pF nF', card: <CapacitorCodeCard /> },
      { title: 'Resistor colour bands', keywords: 'colour color bands stripes resistor', card: <ColourBandsCard /> },
      { title: 'Preferred value', keywords: 'E12 E24 series nearest standard value', card: <PreferredValueCard /> },
    ],
  },
  {
    title: 'Capacitors',
    entries: [
      { title: 'Expected ESR', keywords: 'electrolytic equivalent series resistance', card: <EsrCard /> },
      { title: 'Leakage limit', keywords: 'electrolytic leakage current reform', card: <LeakageCard /> },
      {
        title: 'Stored energy and discharge time',
        keywords: 'discharge bleed resistor safe voltage energy joules',
        card: <DischargeCard />,
      },
    ],
  },
  {
    title: 'RC and time',
    entries: [
      { title: 'RC corner frequency', keywords: 'coupling capacitor cut-off -3 dB filter', card: <RcCornerCard /> },
      { title: 'Time constant', keywords: 'RC tau seconds charge', card: <TimeConstantCard /> },
    ],
  },
  {
    title: 'Valves and bias',
    entries: [
      {
        title: 'Cathode bias',
        keywords: 'cathode resistor bias voltage anode screen current',
        card: <CathodeBiasCard />,
      },
      {
        title: 'Cathode current from a reading',
        keywords: 'cathode voltage resistor current',
        card: <CathodeCurrentCard />,
      },
      {
        title: 'Cathode bypass corner',
        keywords: 'bypass capacitor cathode low frequency',
        card: <BypassCornerCard />,
      },
      { title: 'Valve decoder', keywords: 'tube type designation heater base', card: <ValveDecoderCard /> },
      { title: 'Valve ratings', keywords: 'anode dissipation tube limits', card: <ValveRatingsCard /> },
      {
        title: 'Resistor dissipation',
        keywords: 'watts power rating resistor heat',
        card: <ResistorDissipationCard />,
      },
    ],
  },
  {
    title: 'Mains and power-up',
    entries: [
      {
        title: 'Live chassis check',
        keywords: 'AC/DC live chassis mains isolation transformer',
        card: <LiveChassisCard />,
      },
      {
        title: 'Series heater string',
        keywords: 'heater chain dropper resistor ballast lamp',
        card: <HeaterChainCard />,
      },
      { title: 'Mains tap scaling', keywords: 'transformer tap mains voltage heater', card: <TapScalingCard /> },
      { title: 'Series lamp limit', keywords: 'lamp limiter bulb first power-up', card: <SeriesLampCard /> },
    ],
  },
  {
    title: 'Readings',
    entries: [
      {
        title: 'Reading against the manual',
        keywords: 'voltage chart tolerance verdict service data',
        card: <ReadingVerdictCard />,
      },
      {
        title: 'Meter loading',
        keywords: 'ohms per volt meter sensitivity high impedance',
        card: <MeterLoadingCard />,
      },
      { title: 'Alignment aids', keywords: 'IF intermediate frequency alignment tuning', card: <AlignmentCard /> },
    ],
  },
];

/** The anchor of a calculator on the page: "RC corner frequency" → "calc-rc-corner-frequency". */
export const calculatorAnchor = (title: string) =>
  `calc-${title
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '')}`;

/** Whether an entry answers a search: every word of it appears in the title or the keywords. */
export function matchesSearch(entry: Pick<CatalogueEntry, 'title' | 'keywords'>, search: string): boolean {
  const haystack = `${entry.title} ${entry.keywords}`.toLowerCase();
  return search
    .toLowerCase()
    .split(/\s+/)
    .filter(Boolean)
    .every((word) => haystack.includes(word));
}
