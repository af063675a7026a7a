import type Konva from 'konva';
import { useCallback, useMemo } from 'react';
import { Layer, Shape } from 'react-konva';
import { drawMarks } from '../lib/draw-marks';
import { createSpritePainter } from '../lib/marker-sprites';
import type { Mark } from '../lib/marks';
import type { ImageSize, StageSize, ViewTransform } from '../model/coordinates';

/**
 * Every finding, drawn by one custom shape straight onto the layer's canvas: a thousand marks are one node
 * for React and Konva, not thousands, and a pan or zoom is one redraw, with markers stamped from cached bitmaps.
 * Nothing here listens; hit-testing is the model's (`grabAt`) on the stage's element.
 */
export function FindingsLayer({
  marks,
  view,
  imageSize,
  stage,
  hiddenId,
  pixelRatio,
}: {
  marks: readonly Mark[];
  view: ViewTransform;
  imageSize: ImageSize;
  stage: StageSize;
  /** The finding being dragged, which the overlay draws instead. */
  hiddenId?: number;
  pixelRatio: number;
}) {
  const paintMarker = useMemo(() => createSpritePainter(pixelRatio), [pixelRatio]);
  const sceneFunc = useCallback(
    (context: Konva.Context) => {
      drawMarks(context._context, marks, view, imageSize, stage, hiddenId, paintMarker);
    },
    [marks, view, imageSize, stage, hiddenId, paintMarker],
  );
  return (
    <Layer listening={false}>
      <Shape sceneFunc={sceneFunc} listening={false} perfectDrawEnabled={false} />
    </Layer>
  );
}
