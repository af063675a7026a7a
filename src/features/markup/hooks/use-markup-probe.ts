import { useEffect, type RefObject } from 'react';
import { imagePoint, imageToStage, type ImageSize, type StageSize, type ViewTransform } from '../model/coordinates';

/**
 * `window.__gridleakMarkup`: a read-only look at the markup canvas for end-to-end tests, which cannot see inside
 * a canvas. It is present in every build (it holds nothing private) while a markup canvas is mounted:
 * - `view`: `{ scale, x, y }`, stage px per image px and where the image's top-left corner sits on the stage;
 * - `image`: the photo's size in image px; `stage`: the stage's size in CSS px;
 * - `imageToClient(x, y)`: a normalised image point (0..1) as viewport (client) CSS px, ready for `page.mouse`;
 * - `pending`: the first point of a new mark waiting for its words, normalised, while there is one.
 * A new object replaces it after every view change, so read it again after zooming or panning.
 * When several canvases are on screen (a diagram beside a chassis photo), each one inside an element with
 * `data-markup-probe="<name>"` is also under `window.__gridleakMarkups[name]`.
 */
export interface MarkupProbe {
  readonly view: ViewTransform;
  readonly image: ImageSize;
  readonly stage: StageSize;
  readonly pending?: { readonly x: number; readonly y: number };
  imageToClient(x: number, y: number): { x: number; y: number };
}

declare global {
  interface Window {
    __gridleakMarkup?: MarkupProbe;
    __gridleakMarkups?: Record<string, MarkupProbe>;
  }
}

export function useMarkupProbe(
  ref: RefObject<HTMLElement | null>,
  view: ViewTransform | undefined,
  image: ImageSize,
  stage: StageSize | undefined,
  pending?: { readonly x: number; readonly y: number },
) {
  useEffect(() => {
    if (!view || !stage) return;
    const probe: MarkupProbe = Object.freeze({
      view,
      image,
      stage,
      ...(pending ? { pending: { x: pending.x, y: pending.y } } : {}),
      imageToClient: (x: number, y: number) => {
        const rect = ref.current?.getBoundingClientRect();
        const at = imageToStage(imagePoint(x, y), view, image);
        return { x: (rect?.left ?? 0) + at.x, y: (rect?.top ?? 0) + at.y };
      },
    });
    window.__gridleakMarkup = probe;
    const name = ref.current?.closest('[data-markup-probe]')?.getAttribute('data-markup-probe');
    if (name) window.__gridleakMarkups = { ...window.__gridleakMarkups, [name]: probe };
    return () => {
      if (window.__gridleakMarkup === probe) delete window.__gridleakMarkup;
      if (name && window.__gridleakMarkups?.[name] === probe) delete window.__gridleakMarkups[name];
    };
  }, [ref, view, image, stage, pending]);
}
