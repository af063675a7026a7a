import type { Tool } from '../model/tools';

const paths: Record<Tool, string> = {
  select: 'M5 3v13l3.5-3.2 2.6 5.6 2.2-1-2.6-5.5H15Z',
  pin: 'M10 2.5a5 5 0 0 1 5 5c0 3.6-5 9.5-5 9.5S5 11.1 5 7.5a5 5 0 0 1 5-5Zm0 3a2 2 0 1 0 0 4 2 2 0 0 0 0-4Z',
  circle: 'M10 3a7 7 0 1 1 0 14 7 7 0 0 1 0-14Z',
  rect: 'M3 5h14v10H3Z',
  arrow: 'M4 16 16 4M9 4h7v7',
  freehand: 'M3 14c2-7 4-8 5-3s2 5 4 0 4-4 5 1',
};

/** A small line drawing of each tool, in the text colour. */
export function ToolIcon({ tool }: { tool: Tool }) {
  const filled = tool === 'select' || tool === 'pin';
  return (
    <svg viewBox="0 0 20 20" width={20} height={20} aria-hidden="true" className="shrink-0">
      <path
        d={paths[tool]}
        fill={filled ? 'currentColor' : 'none'}
        fillRule="evenodd"
        stroke={filled ? 'none' : 'currentColor'}
        strokeWidth={2}
        strokeLinecap="round"
        strokeLinejoin="round"
      />
    </svg>
  );
}
