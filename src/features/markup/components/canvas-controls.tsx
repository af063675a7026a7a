import { controlClass } from '../lib/control-styles';
import type { Tool } from '../model/tools';
import { MarkupToolbar } from './markup-toolbar';
import { ZoomControls } from './zoom-controls';

type Panel = 'legend' | 'help';

/** The strip above the stage: tools, undo, zoom, and the legend and keys panels; only zoom and legend when read-only. */
export function CanvasControls({
  readOnly = false,
  tool,
  canCreate,
  onTool,
  keepTool = false,
  onKeepTool,
  canUndo,
  onUndo,
  scale,
  onZoomIn,
  onZoomOut,
  onFit,
  onActualSize,
  panel,
  onPanel,
}: {
  readOnly?: boolean;
  tool: Tool;
  canCreate: boolean;
  onTool: (tool: Tool) => void;
  /** Keep the drawing tool after a finding is saved, rather than going back to Select. */
  keepTool?: boolean;
  onKeepTool?: (keep: boolean) => void;
  canUndo: boolean;
  onUndo: () => void;
  scale: number | undefined;
  onZoomIn: () => void;
  onZoomOut: () => void;
  onFit: () => void;
  onActualSize: () => void;
  panel: Panel | undefined;
  onPanel: (panel: Panel) => void;
}) {
  return (
    <div className="flex flex-wrap items-center gap-x-3 gap-y-1 border-b border-rule px-2 py-1">
      {!readOnly && (
        <>
          <MarkupToolbar tool={tool} canCreate={canCreate} onChange={onTool} />
          <button
            type="button"
            onClick={onUndo}
            disabled={!canUndo}
            aria-keyshortcuts="Control+Z Meta+Z"
            title="Undo (Ctrl+Z)"
            className={controlClass}
          >
            Undo
          </button>
          {canCreate && onKeepTool && (
            <label
              className="hidden min-h-11 items-center gap-1.5 text-sm text-ink-soft md:flex"
              title="After a finding is saved, stay on the tool instead of going back to Select"
            >
              <input
                type="checkbox"
                checked={keepTool}
                onChange={(e) => onKeepTool(e.target.checked)}
                className="size-4 accent-glow"
              />
              Keep tool
            </label>
          )}
        </>
      )}
      <ZoomControls scale={scale} onZoomIn={onZoomIn} onZoomOut={onZoomOut} onFit={onFit} onActualSize={onActualSize} />
      <div className="ml-auto flex items-center gap-1">
        <button
          type="button"
          aria-expanded={panel === 'legend'}
          onClick={() => onPanel('legend')}
          className={controlClass}
        >
          Legend
        </button>
        {!readOnly && (
          <button
            type="button"
            aria-expanded={panel === 'help'}
            aria-keyshortcuts="?"
            title="Keys and gestures (?)"
            onClick={() => onPanel('help')}
            className={`${controlClass} max-md:hidden`}
          >
            Keys{' '}
            <kbd aria-hidden="true" className="rounded border border-rule px-1 font-mono text-xs text-ink-soft">
              ?
            </kbd>
          </button>
        )}
      </div>
    </div>
  );
}
