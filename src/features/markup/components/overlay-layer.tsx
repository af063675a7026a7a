import type Konva from 'konva';
import { useCallback } from 'react';
import { Layer, Shape } from 'react-konva';
import { drawOverlay, type OverlayScene } from '../lib/draw-overlay';
import type { ImageSize, ViewTransform } from '../model/coordinates';

/** The top layer: the mark being drawn or dragged, a new mark awaiting its title, the selection and its handles. */
export function OverlayLayer({
  scene,
  view,
  imageSize,
}: {
  scene: OverlayScene;
  view: ViewTransform;
  imageSize: ImageSize;
}) {
  const sceneFunc = useCallback(
    (context: Konva.Context) => {
      drawOverlay(context._context, scene, view, imageSize);
    },
    [scene, view, imageSize],
  );
  return (
    <Layer listening={false}>
      <Shape sceneFunc={sceneFunc} listening={false} perfectDrawEnabled={false} />
    </Layer>
  );
}
