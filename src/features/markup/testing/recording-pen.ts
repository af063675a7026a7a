import type { Pen } from '../lib/pen';

/** One call on the pen, with the style in force when it was made. */
export interface PenCall {
  readonly op: string;
  readonly args: readonly unknown[];
  readonly fillStyle: unknown;
  readonly strokeStyle: unknown;
  readonly lineWidth: number;
}

/** A pen that records what was drawn, so drawing helpers can be tested without a canvas. */
export function recordingPen(): Pen & { calls: PenCall[] } {
  const calls: PenCall[] = [];
  const pen = {
    calls,
    fillStyle: '#000000' as Pen['fillStyle'],
    strokeStyle: '#000000' as Pen['strokeStyle'],
    lineWidth: 1,
    font: '10px sans-serif',
    textAlign: 'start' as CanvasTextAlign,
    textBaseline: 'alphabetic' as CanvasTextBaseline,
    lineJoin: 'miter' as CanvasLineJoin,
    lineCap: 'butt' as CanvasLineCap,
  };
  const record =
    (op: string) =>
    (...args: unknown[]) => {
      calls.push({ op, args, fillStyle: pen.fillStyle, strokeStyle: pen.strokeStyle, lineWidth: pen.lineWidth });
    };
  const ops = [
    'beginPath',
    'moveTo',
    'lineTo',
    'arc',
    'rect',
    'closePath',
    'fill',
    'stroke',
    'fillText',
    'save',
    'restore',
    'setLineDash',
  ];
  return Object.assign(pen, Object.fromEntries(ops.map((op) => [op, record(op)]))) as unknown as Pen & {
    calls: PenCall[];
  };
}
