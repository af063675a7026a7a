import { useCallback, useLayoutEffect, useMemo, useRef, useState } from 'react';
import {
  actualSize,
  clampPan,
  fitTransform,
  focusOn,
  pan,
  pinchZoom,
  stagePoint,
  stageToImage,
  zoomAt,
  zoomLimits,
  type ImageBounds,
  type ImagePoint,
  type ImageSize,
  type StagePoint,
  type StageSize,
  type TouchPair,
  type ViewTransform,
} from '../model/coordinates';

export interface ViewControls {
  /** The transform to draw with; undefined until the stage has a size. */
  readonly view: ViewTransform | undefined;
  /** The newest transform, for event handlers that run several times between renders. */
  readonly latest: () => ViewTransform | undefined;
  zoomBy(factor: number, at?: StagePoint): void;
  fit(): void;
  actualSize(): void;
  panBy(dx: number, dy: number): void;
  pinch(prev: TouchPair, next: TouchPair): void;
  focus(target: ImagePoint | ImageBounds): void;
}

const centreOf = (stage: StageSize) => stagePoint(stage.width / 2, stage.height / 2);

/**
 * The canvas's view transform. It starts fitted and stays fitted through resizes until the person zooms or pans;
 * after that a resize only keeps the photo from being lost off the edge. Every change is clamped (`clampPan`).
 */
export function useView(image: ImageSize, stage: StageSize | undefined): ViewControls {
  const [view, setView] = useState<ViewTransform>();
  const viewRef = useRef<ViewTransform | undefined>(undefined);
  const stageRef = useRef<StageSize | undefined>(undefined);
  const fitted = useRef(true);

  const commit = useCallback((next: ViewTransform, isFitted: boolean) => {
    viewRef.current = next;
    fitted.current = isFitted;
    setView(next);
  }, []);

  useLayoutEffect(() => {
    stageRef.current = stage;
    if (!stage) return;
    const current = viewRef.current;
    commit(
      !current || fitted.current ? fitTransform(image, stage) : clampPan(current, image, stage),
      !current || fitted.current,
    );
  }, [stage, image, commit]);

  const apply = useCallback(
    (change: (v: ViewTransform, s: StageSize) => ViewTransform, isFitted = false) => {
      const v = viewRef.current;
      const s = stageRef.current;
      if (v && s) commit(clampPan(change(v, s), image, s), isFitted);
    },
    [image, commit],
  );

  return useMemo(
    () => ({
      view,
      latest: () => viewRef.current,
      zoomBy: (factor, at) => apply((v, s) => zoomAt(v, at ?? centreOf(s), factor, zoomLimits(image, s))),
      fit: () => apply((_v, s) => fitTransform(image, s), true),
      actualSize: () => apply((v, s) => actualSize(image, s, stageToImage(centreOf(s), v, image))),
      panBy: (dx, dy) => apply((v) => pan(v, dx, dy)),
      pinch: (prev, next) => apply((v, s) => pinchZoom(v, prev, next, zoomLimits(image, s))),
      focus: (target) => apply((v, s) => focusOn(v, image, s, target)),
    }),
    [view, apply, image],
  );
}
