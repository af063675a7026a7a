import { Image as KonvaImage, Layer } from 'react-konva';
import { imagePoint, imageToStage, type ImageSize, type ViewTransform } from '../model/coordinates';

/** The photo, placed by `imageToStage` at its corners. It never listens: all input is read on the stage's element. */
export function PhotoLayer({
  image,
  imageSize,
  view,
}: {
  image: HTMLImageElement | undefined;
  imageSize: ImageSize;
  view: ViewTransform;
}) {
  const topLeft = imageToStage(imagePoint(0, 0), view, imageSize);
  const bottomRight = imageToStage(imagePoint(1, 1), view, imageSize);
  return (
    <Layer listening={false}>
      {image && (
        <KonvaImage
          image={image}
          x={topLeft.x}
          y={topLeft.y}
          width={bottomRight.x - topLeft.x}
          height={bottomRight.y - topLeft.y}
          listening={false}
          perfectDrawEnabled={false}
        />
      )}
    </Layer>
  );
}
