import { imageToStage, type ImagePoint, type ImageSize, type ViewTransform } from '../model/coordinates';

/** Arm length of the keyboard crosshair, CSS px. */
const ARM_PX = 18;

/**
 * The keyboard crosshair over the stage: two amber lines with a dark halo, so it reads on light and dark parts
 * of a photo, and a ring where a shape begun with Enter started. Decorative: the live region says where it is.
 */
export function CrosshairMark({
  at,
  anchor,
  view,
  image,
}: {
  at: ImagePoint;
  anchor?: ImagePoint;
  view: ViewTransform;
  image: ImageSize;
}) {
  const p = imageToStage(at, view, image);
  const a = anchor ? imageToStage(anchor, view, image) : undefined;
  const line = 'absolute bg-glow shadow-[0_0_0_1.5px_rgb(0_0_0/0.75)]';
  return (
    <div aria-hidden="true" data-testid="markup-crosshair" className="pointer-events-none absolute inset-0">
      <div className="absolute" style={{ left: p.x, top: p.y }}>
        <span className={`${line} h-0.5`} style={{ left: -ARM_PX, top: -1, width: ARM_PX * 2 }} />
        <span className={`${line} w-0.5`} style={{ top: -ARM_PX, left: -1, height: ARM_PX * 2 }} />
        <span className="absolute -top-1.5 -left-1.5 size-3 rounded-full border-2 border-glow shadow-[0_0_0_1.5px_rgb(0_0_0/0.75)]" />
      </div>
      {a && (
        <span
          className="absolute size-4 -translate-x-1/2 -translate-y-1/2 rounded-full border-2 border-dashed border-glow"
          style={{ left: a.x, top: a.y }}
        />
      )}
    </div>
  );
}
