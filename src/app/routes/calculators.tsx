import { AlignmentCard } from '../../features/calculators/components/alignment-card';
import { BypassCornerCard } from '../../features/calculators/components/bypass-corner-card';
import { CalculatorGroup } from '../../features/calculators/components/calculator-group';
import { CapacitorCodeCard } from '../../features/calculators/components/capacitor-code-card';
import { CathodeBiasCard } from '../../features/calculators/components/cathode-bias-card';
import { CathodeCurrentCard } from '../../features/calculators/components/cathode-current-card';
import { ColourBandsCard } from '../../features/calculators/components/colour-bands-card';
import { DischargeCard } from '../../features/calculators/components/discharge-card';
import { EsrCard } from '../../features/calculators/components/esr-card';
import { HeaterChainCard } from '../../features/calculators/components/heater-chain-card';
import { LeakageCard } from '../../features/calculators/components/leakage-card';
import { LiveChassisCard } from '../../features/calculators/components/live-chassis-card';
import { MeterLoadingCard } from '../../features/calculators/components/meter-loading-card';
import { PreferredValueCard } from '../../features/calculators/components/preferred-value-card';
import { RcCornerCard } from '../../features/calculators/components/rc-corner-card';
import { ReadingVerdictCard } from '../../features/calculators/components/reading-verdict-card';
import { ResistorDissipationCard } from '../../features/calculators/components/resistor-dissipation-card';
import { SeriesLampCard } from '../../features/calculators/components/series-lamp-card';
import { TapScalingCard } from '../../features/calculators/components/tap-scaling-card';
import { TimeConstantCard } from '../../features/calculators/components/time-constant-card';
import { ValueReaderCard } from '../../features/calculators/components/value-reader-card';
import { ValveDecoderCard } from '../../features/calculators/components/valve-decoder-card';
import { ValveRatingsCard } from '../../features/calculators/components/valve-ratings-card';

export function CalculatorsRoute() {
  return (
    <div className="space-y-8">
      <div>
        <h1 className="text-2xl font-bold">Bench calculators</h1>
        <p className="text-ink-soft">
          Type values the way they are printed (2k2, 330R, 8 MF, 350 WV, 6n8) and the answer follows as you type.
        </p>
      </div>
      <CalculatorGroup title="Reading parts">
        <ValueReaderCard />
        <CapacitorCodeCard />
        <ColourBandsCard />
        <PreferredValueCard />
      </CalculatorGroup>
      <CalculatorGroup title="Capacitors">
        <EsrCard />
        <LeakageCard />
        <DischargeCard />
      </CalculatorGroup>
      <CalculatorGroup title="RC and time">
        <RcCornerCard />
        <TimeConstantCard />
      </CalculatorGroup>
      <CalculatorGroup title="Valves and bias">
        <CathodeBiasCard />
        <CathodeCurrentCard />
        <BypassCornerCard />
        <ValveDecoderCard />
        <ValveRatingsCard />
        <ResistorDissipationCard />
      </CalculatorGroup>
      <CalculatorGroup title="Mains and power-up">
        <LiveChassisCard />
        <HeaterChainCard />
        <TapScalingCard />
        <SeriesLampCard />
      </CalculatorGroup>
      <CalculatorGroup title="Readings">
        <ReadingVerdictCard />
        <MeterLoadingCard />
        <AlignmentCard />
      </CalculatorGroup>
    </div>
  );
}
