import { useState } from 'react';
import { formatQuantity, liveChassisLikely, valveType } from '../../../../shared/bench';
import type { HeaterSupply, ValveHeater } from '../../../../shared/bench';
import { calculate } from '../lib/outcome';
import { CalculatorCard } from './calculator-card';
import { ResultPanel } from './result-panel';
import { MainResult, ResultLine, ResultList, ResultNote } from './result-line';
import { TextInput } from './text-input';
import { ValveTypicalData } from './valve-typical-data';

const SUPPLY_WORDS: Record<HeaterSupply, string> = {
  parallel: 'parallel',
  series: 'series string',
  battery: 'battery',
  none: 'no heater',
};

function heaterText(heater: ValveHeater): string {
  const volts = heater.volts === undefined ? '' : formatQuantity(heater.volts, 'V');
  const amps = heater.amps === undefined ? '' : formatQuantity(heater.amps, 'A');
  return [[volts, amps].filter(Boolean).join(', '), SUPPLY_WORDS[heater.supply]].filter(Boolean).join(' · ');
}

/** valveType: what a European valve name says about its heater, its electrodes and its base, with typical data. */
export function ValveDecoderCard() {
  const [name, setName] = useState('UL84');
  const outcome = calculate([name.trim() === '' ? undefined : name], ([text]) => {
    const valve = valveType(text);
    return { valve, live: liveChassisLikely([valve.designation]).likely };
  });
  const error = outcome.status === 'refused' ? outcome.message : undefined;
  return (
    <CalculatorCard
      title="Valve decoder"
      description="What a valve name says: heater, electrodes, base. European and American names."
      formula="European: heater letter + system letters + base digits, e.g. U·L·84 = 100 mA series heater, output pentode, noval. American: heater volts + letters + element count + suffix, e.g. 6·V·6·GT"
      source="European valve type code (heater letter, system letters, base digits) and American type numbers, per numbering-systems articles and valve data handbooks; typical data from makers’ published figures where marked"
    >
      <TextInput
        label="Valve type"
        value={name}
        onChange={setName}
        placeholder="e.g. UL84, ECC82, E88CC, 6V6GT"
        error={error}
        capitals
      />
      <ResultPanel
        outcome={outcome}
        waiting="Type a valve name, for example UL84 or 6V6GT."
        invalid={error !== undefined}
      >
        {({ valve, live }) => (
          <>
            <MainResult label={valve.data?.description ?? 'Not in Gridleak’s table'} value={valve.designation} />
            {valve.specialQuality && <ResultNote>{`Special-quality form of the ${valve.standardForm}.`}</ResultNote>}
            <ResultList>
              <ResultLine
                label={
                  valve.scheme === 'american'
                    ? `Heater (leading ${valve.heater.letter})`
                    : valve.heater.letter
                      ? `Heater (${valve.heater.letter})`
                      : 'Heater'
                }
              >
                {heaterText(valve.heater)}
              </ResultLine>
              {valve.systems.length > 0 && <ResultLine label="Electrodes">{valve.systems.join('; ')}</ResultLine>}
              {valve.suffixWords && valve.suffixWords.length > 0 && (
                <ResultLine label="Suffix">{valve.suffixWords.join('; ')}</ResultLine>
              )}
              <ResultLine label="Base">{valve.base}</ResultLine>
              <ResultLine label="Equivalents">
                {valve.equivalents.length > 0 ? valve.equivalents.join(', ') : 'none listed'}
              </ResultLine>
            </ResultList>
            {valve.heater.note && (
              <ResultNote>{`${valve.scheme === 'european' ? `Heater letter ${valve.heater.letter}: ` : 'Heater: '}${valve.heater.note}.`}</ResultNote>
            )}
            {live && (
              <p className="text-sm font-semibold text-danger">
                <span aria-hidden="true">⚠ </span>A series-heater valve: sets built around it are usually AC/DC, with a
                live chassis.
              </p>
            )}
            {valve.data ? (
              <ValveTypicalData data={valve.data} />
            ) : (
              <ResultNote>
                The name decodes, but this type is not in Gridleak’s table, so there is no typical data.
              </ResultNote>
            )}
          </>
        )}
      </ResultPanel>
    </CalculatorCard>
  );
}
