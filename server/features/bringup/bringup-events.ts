import {
  decisionLabels,
  intakeItemWords,
  lampBehaviourLabels,
  prePowerItemWords,
  prePowerStatusLabels,
  supplyLabels,
  type IntakeItem,
  type PrePowerItem,
  type PrePowerStatus,
} from '../../../shared/schemas/bringup';

type Data = Record<string, unknown>;
export const bringupEventKinds = [
  'intake-checked',
  'pre-power-set',
  'pre-power-signed',
  'pre-power-voided',
  'bringup-step',
] as const;
type Kind = (typeof bringupEventKinds)[number];

export const isBringupEvent = (kind: string): kind is Kind => (bringupEventKinds as readonly string[]).includes(kind);

const preLabel = (item: unknown) => prePowerItemWords[item as PrePowerItem]?.label ?? String(item);

/**
 * A bring-up event in words, and whether it is a safety departure shown in red (a waived pre-power item,
 * a sign-off with waivers, a stop at power-up).
 */
export function bringupEventWords(kind: Kind, data: Data): { summary: string; caution: boolean } {
  switch (kind) {
    case 'intake-checked':
      return {
        summary: `Intake: ${intakeItemWords[data.item as IntakeItem]?.label ?? data.item} ${data.done ? 'checked' : 'unticked'}`,
        caution: false,
      };
    case 'pre-power-set': {
      const status = data.status as PrePowerStatus | null;
      if (status === 'waived')
        return { summary: `Pre-power item waived: ${preLabel(data.item)} — ${data.reason}`, caution: true };
      const words = status ? prePowerStatusLabels[status].toLowerCase() : 'cleared';
      return {
        summary: `Pre-power: ${preLabel(data.item)} ${words}${data.reason ? ` (${data.reason})` : ''}`,
        caution: false,
      };
    }
    case 'pre-power-signed': {
      const waived = (data.waived as { item: string; reason: string }[] | undefined) ?? [];
      if (!waived.length) return { summary: 'Pre-power checklist signed off', caution: false };
      return {
        summary: `Pre-power checklist signed off with ${waived.length} waived: ${waived.map((w) => `${preLabel(w.item)} — ${w.reason}`).join('; ')}`,
        caution: true,
      };
    }
    case 'pre-power-voided':
      return {
        summary: `Pre-power sign-off withdrawn: ${preLabel(data.item)} changed; sign the checklist off again before powering`,
        caution: true,
      };
    case 'bringup-step': {
      const supply = supplyLabels[data.supply as keyof typeof supplyLabels] ?? String(data.supply);
      const lamp = data.lampWatts ? ` ${data.lampWatts} W` : '';
      const behaviour =
        data.lampBehaviour && data.lampBehaviour !== 'no-lamp'
          ? `, lamp: ${lampBehaviourLabels[data.lampBehaviour as keyof typeof lampBehaviourLabels].toLowerCase()}`
          : '';
      const stop = data.decision === 'stop';
      return {
        summary: `Power-up step ${data.number}: ${supply.toLowerCase()}${lamp}${behaviour} — ${decisionLabels[data.decision as keyof typeof decisionLabels].toLowerCase()}`,
        caution: stop,
      };
    }
  }
}
