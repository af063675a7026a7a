import { Stage } from 'react-konva';
import type { OverlayScene } from '../lib/draw-overlay';
import type { Mark } from '../lib/marks';
import type { ImageSize, StageSize, ViewTransform } from '../model/coordinates';
import { FindingsLayer } from './findings-layer';
import { OverlayLayer } from './overlay-layer';
import { PhotoLayer } from './photo-layer';

/**
 * The Konva stage, three layers: the photo, the findings, and the overlay (draft, selection, handles). Nothing on
 * it listens; the element around it takes the pointer. Keyed on the pixel ratio so a move to another screen
 * remakes the layers' canvases at the new density.
 */
export function MarkupStage({
  size,
  pixelRatio,
  image,
  imageSize,
  view,
  marks,
  scene,
}: {
  size: StageSize;
  pixelRatio: number;
  image: HTMLImageElement | undefined;
  imageSize: ImageSize;
  view: ViewTransform;
  marks: readonly Mark[];
  scene: OverlayScene;
}) {
  return (
    <Stage key={pixelRatio} width={size.width} height={size.height} listening={false}>
      <PhotoLayer image={image} imageSize={imageSize} view={view} />
      <FindingsLayer
        marks={marks}
        view={view}
        imageSize={imageSize}
        stage={size}
        hiddenId={scene.draft?.id}
        pixelRatio={pixelRatio}
      />
      <OverlayLayer scene={scene} view={view} imageSize={imageSize} />
    </Stage>
  );
}
