import { useEffect, useMemo, useRef, useState, type RefObject } from 'react';
import { useCanvasPointer } from '../hooks/use-canvas-pointer';
import { useContainerSize } from '../hooks/use-container-size';
import { useCrosshair } from '../hooks/use-crosshair';
import { useMarkupCommands, type CommandCallbacks } from '../hooks/use-markup-commands';
import { useMarkupKeys } from '../hooks/use-markup-keys';
import { useMarkupProbe } from '../hooks/use-markup-probe';
import { usePhotoImage } from '../hooks/use-photo-image';
import { usePixelRatio } from '../hooks/use-pixel-ratio';
import { useRevealPending } from '../hooks/use-reveal-pending';
import { useView } from '../hooks/use-view';
import type { NewMark } from '../../../lib/new-mark';
import type { PictureCanvasProps } from '../../../lib/picture-canvas';
import { ZOOM_STEP } from '../lib/zoom';
import { imagePoint } from '../model/coordinates';
import { bounds, toGeometry } from '../model/geometry';
import type { Draft, Tool, ToolResult } from '../model/tools';
import { useStoredFlag } from '../../../lib/use-stored-flag';
import { CanvasControls } from './canvas-controls';
import { CrosshairMark } from './crosshair-mark';
import { MarkupLegend } from './markup-legend';
import { MarkupStage } from './markup-stage';
import { ShortcutHelp } from './shortcut-help';

export interface MarkupCanvasProps extends PictureCanvasProps, CommandCallbacks {
  /** A new mark waiting for its title, drawn dashed until the page creates or drops it. */
  pendingMark?: NewMark;
  /** The photo has loaded (or failed) and the frame with it and the marks is on screen. */
  onFirstFrame?: () => void;
  /** What may cover the photo while a new mark waits (the phone's bottom sheet): the mark is panned clear of it. */
  pendingCover?: RefObject<HTMLElement | null>;
}

/**
 * The photo markup canvas: the photo on a Konva stage that fills its container, the findings drawn over it, the
 * tools, zoom and pan by mouse, keys and touch. Props in, callbacks out; it fetches nothing.
 */
export function MarkupCanvas(props: MarkupCanvasProps) {
  const { items, selectedId, focusId, focusWhenReading, canCreate, canEdit, onSelect, pendingMark } = props;
  const { ref, size } = useContainerSize<HTMLDivElement>();
  const imageSize = useMemo(
    () => ({ width: props.imageSize.width, height: props.imageSize.height }),
    [props.imageSize.width, props.imageSize.height],
  );
  const photo = usePhotoImage(props.imageUrl, props.onImageError);
  const pixelRatio = usePixelRatio();
  const view = useView(imageSize, size);
  // The stage is drawn once it has a size and a view; a photo that arrives before that must not count as the frame
  // (the page holds work such as a thousand list rows until then).
  const staged = size !== undefined && view.view !== undefined;
  const firstFrame = useRef(props.onFirstFrame);
  useEffect(() => {
    if (photo.status === 'loading' || !staged || !firstFrame.current) return;
    const notify = firstFrame.current;
    firstFrame.current = undefined;
    // Two animation frames: the stage has drawn the photo and its marks by then.
    requestAnimationFrame(() => requestAnimationFrame(() => notify()));
  }, [photo.status, staged]);
  const [tool, setTool] = useState<Tool>('select');
  const [keepTool, setKeepTool] = useStoredFlag('gridleak.markup.keep-tool');
  // Once a mark drawn here is saved as a finding: back to Select unless the person keeps the tool, and a finding
  // made from the keyboard hands focus back to the photo for the next one.
  const commands = useMarkupCommands(props, () => {
    if (!keepTool) setTool('select');
    if (crosshair.placedByKeyboard()) ref.current?.focus({ preventScroll: true });
  });
  const [draft, setDraft] = useState<Draft>();
  const [panel, setPanel] = useState<'legend' | 'help'>();
  const [spaceHeld, setSpaceHeld] = useState(false);

  const editable = useMemo(() => new Set(items.filter(canEdit).map((f) => f.id)), [items, canEdit]);
  // Someone who may neither place nor change a mark reads the photo: no tools, no undo, and it stays at Fit
  // unless the page asks for the part (`focusWhenReading`).
  const readOnly = !canCreate && editable.size === 0;
  const selected = commands.marks.find((m) => m.id === selectedId);
  const onResult = (result: ToolResult) => {
    if (result.command) commands.run(result.command);
    if (result.selection !== undefined) onSelect(result.selection ?? undefined);
  };
  const pointer = useCanvasPointer(ref, {
    image: imageSize,
    tool,
    marks: commands.marks,
    selectedId,
    canCreate,
    canEdit: (id) => editable.has(id),
    spaceHeld,
    view,
    onDraft: setDraft,
    onResult,
    onClick: (id) => onSelect(id ?? undefined),
  });
  const crosshair = useCrosshair({
    tool,
    image: imageSize,
    stage: size,
    view,
    marks: commands.marks,
    run: commands.run,
    onSelect,
  });
  const closePanel = () => {
    setPanel(undefined);
    ref.current?.focus();
  };
  const keys = useMarkupKeys({
    tool,
    canCreate,
    selectedId: selected?.id,
    canEditSelected: selected ? editable.has(selected.id) : false,
    image: imageSize,
    view,
    stage: ref,
    setTool,
    cancelGesture: () => pointer.cancel() || crosshair.cancel(),
    crosshair,
    toggleHelp: () => setPanel((p) => (p === 'help' ? undefined : 'help')),
    setSpaceHeld,
    onSelect,
    run: commands.run,
    remove: commands.remove,
    undo: commands.undo,
  });

  // Zoom onto `focusId` once the stage has a size and the finding is here; again only when it changes.
  const focused = useRef<number | undefined>(undefined);
  const ready = view.view !== undefined;
  useEffect(() => {
    if (focusId === undefined) focused.current = undefined;
    const mark = commands.marks.find((m) => m.id === focusId);
    if ((readOnly && !focusWhenReading) || !ready || !mark || focused.current === focusId) return;
    focused.current = focusId;
    view.focus(mark.shape === 'pin' ? (mark.points[0] ?? imagePoint(0.5, 0.5)) : bounds(mark, imageSize));
  }, [focusId, readOnly, focusWhenReading, ready, commands.marks, view, imageSize]);

  useMarkupProbe(ref, view.view, imageSize, size, pendingMark?.points[0]);
  useRevealPending(ref, props.pendingCover, pendingMark, view, imageSize);
  const scene = useMemo(
    () => ({
      draft: draft ?? crosshair.draft,
      dragging: draft?.id === undefined ? undefined : commands.marks.find((m) => m.id === draft.id),
      pending: pendingMark ? toGeometry(pendingMark) : undefined,
      selected,
      editable: selected ? editable.has(selected.id) : false,
    }),
    [draft, crosshair.draft, commands.marks, pendingMark, selected, editable],
  );

  return (
    <div
      className="flex h-full min-h-0 flex-col overflow-hidden rounded-xl border border-rule bg-panel"
      onKeyDown={keys.onKeyDown}
      onKeyUp={keys.onKeyUp}
    >
      <CanvasControls
        readOnly={readOnly}
        tool={tool}
        canCreate={canCreate}
        onTool={(t) => {
          pointer.cancel();
          setTool(t);
        }}
        keepTool={keepTool}
        onKeepTool={setKeepTool}
        canUndo={commands.canUndo}
        onUndo={commands.undo}
        scale={view.view?.scale}
        onZoomIn={() => view.zoomBy(ZOOM_STEP)}
        onZoomOut={() => view.zoomBy(1 / ZOOM_STEP)}
        onFit={view.fit}
        onActualSize={view.actualSize}
        panel={panel}
        onPanel={(p) => setPanel((open) => (open === p ? undefined : p))}
      />
      <div className="relative min-h-0 flex-1">
        <div
          ref={ref}
          data-testid="markup-stage"
          tabIndex={0}
          role="application"
          aria-roledescription="photo markup"
          aria-label={`${props.label ? `${props.label}. ` : ''}${items.length} ${items.length === 1 ? 'finding' : 'findings'}.${readOnly ? ' Arrow keys move a crosshair; Enter picks the finding there.' : ' Arrow keys move a crosshair; Enter marks there. Press ? for keys.'}`}
          className="absolute inset-0 touch-none overflow-hidden bg-bakelite select-none focus-visible:outline-offset-[-3px]"
          {...crosshair.stageHandlers}
          onBlur={() => {
            setSpaceHeld(false);
            crosshair.hide();
          }}
          onContextMenu={(e) => e.preventDefault()}
          {...pointer.handlers}
        >
          {size && view.view && (
            <MarkupStage
              size={size}
              pixelRatio={pixelRatio}
              image={photo.image}
              imageSize={imageSize}
              view={view.view}
              marks={commands.marks}
              scene={scene}
            />
          )}
          {crosshair.shown && crosshair.state && view.view && (
            <CrosshairMark at={crosshair.state.at} anchor={crosshair.state.anchor} view={view.view} image={imageSize} />
          )}
        </div>
        {photo.status !== 'loaded' && (
          <p
            role="status"
            className="pointer-events-none absolute bottom-3 left-1/2 -translate-x-1/2 rounded-full bg-panel/90 px-3 py-1 text-sm"
          >
            {photo.status === 'error' ? 'The photo did not load. Reload the page to try again.' : 'Loading the photo…'}
          </p>
        )}
        {panel === 'legend' && <MarkupLegend onClose={closePanel} />}
        {panel === 'help' && !readOnly && <ShortcutHelp onClose={closePanel} />}
      </div>
      <p role="status" className="sr-only">
        {commands.message}
      </p>
      <p aria-live="polite" className="sr-only" data-testid="markup-crosshair-position">
        {crosshair.description}
      </p>
      {commands.confirmDialog}
    </div>
  );
}
