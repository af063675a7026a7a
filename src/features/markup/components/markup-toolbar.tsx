import { useRef, type KeyboardEvent } from 'react';
import { controlClass } from '../lib/control-styles';
import { toolLabels, toolShortcut } from '../lib/tool-labels';
import { tools, type Tool } from '../model/tools';
import { ToolIcon } from './tool-icon';

const moves: Record<string, (i: number, n: number) => number> = {
  ArrowRight: (i, n) => (i + 1) % n,
  ArrowDown: (i, n) => (i + 1) % n,
  ArrowLeft: (i, n) => (i - 1 + n) % n,
  ArrowUp: (i, n) => (i - 1 + n) % n,
  Home: () => 0,
  End: (_i, n) => n - 1,
};

/**
 * The tools, one pressed at a time. A toolbar is one Tab stop: the arrow keys (and Home, End) move between its
 * buttons, Enter or Space picks one; each tool's letter works from anywhere on the canvas. People who may not
 * create findings see Select only.
 */
export function MarkupToolbar({
  tool,
  canCreate,
  onChange,
}: {
  tool: Tool;
  canCreate: boolean;
  onChange: (tool: Tool) => void;
}) {
  const shown = canCreate ? tools : tools.filter((t) => t === 'select');
  const buttons = useRef<(HTMLButtonElement | null)[]>([]);
  const onKeyDown = (e: KeyboardEvent) => {
    const move = moves[e.key];
    const at = buttons.current.findIndex((b) => b === document.activeElement);
    if (!move || at < 0) return;
    e.preventDefault();
    buttons.current[move(at, shown.length)]?.focus();
  };
  return (
    <div role="toolbar" aria-label="Markup tools" className="flex flex-wrap items-center gap-1" onKeyDown={onKeyDown}>
      {shown.map((t, i) => {
        const key = toolShortcut(t);
        return (
          <button
            key={t}
            ref={(node) => {
              buttons.current[i] = node;
            }}
            type="button"
            aria-pressed={tool === t}
            aria-keyshortcuts={key}
            title={key ? `${toolLabels[t]} (${key})` : toolLabels[t]}
            tabIndex={tool === t || (!shown.includes(tool) && i === 0) ? 0 : -1}
            onClick={() => onChange(t)}
            className={controlClass}
          >
            <ToolIcon tool={t} />
            <span className="sr-only md:not-sr-only">{toolLabels[t]}</span>
            {key && (
              <kbd
                aria-hidden="true"
                className="hidden rounded border border-rule px-1 font-mono text-xs text-ink-soft md:inline"
              >
                {key}
              </kbd>
            )}
          </button>
        );
      })}
    </div>
  );
}
