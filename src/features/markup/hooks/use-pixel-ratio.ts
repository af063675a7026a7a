import Konva from 'konva';
import { useEffect, useState } from 'react';

const deviceRatio = (): number => (typeof window !== 'undefined' && window.devicePixelRatio) || 1;

// Konva sizes each layer's backing canvas by Konva.pixelRatio when the layer is made, so this is set once, here,
// before any stage exists: one canvas pixel per device pixel keeps the photo and the marks crisp from a phone to 4K.
Konva.pixelRatio = deviceRatio();

/**
 * The device pixel ratio, followed when it changes (the window moves to another screen, or the browser zooms).
 * Key the Stage on it: its layers are then made again at the new ratio.
 */
export function usePixelRatio(): number {
  const [ratio, setRatio] = useState(deviceRatio);
  useEffect(() => {
    if (typeof window.matchMedia !== 'function') return;
    const query = window.matchMedia(`(resolution: ${ratio}dppx)`);
    const onChange = () => {
      Konva.pixelRatio = deviceRatio();
      setRatio(Konva.pixelRatio);
    };
    query.addEventListener('change', onChange);
    return () => query.removeEventListener('change', onChange);
  }, [ratio]);
  return ratio;
}
