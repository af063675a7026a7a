import { useEffect, useRef, useState } from 'react';

export type PhotoImage =
  | { readonly status: 'loading' | 'error'; readonly image?: HTMLImageElement }
  | { readonly status: 'loaded'; readonly image: HTMLImageElement };

/**
 * Loads the display image for the canvas. No `crossOrigin`: the canvas only shows the photo and never reads its
 * pixels, so the storage origin needs no CORS headers. When the URL changes (a fresh presigned URL for the same
 * photo) the image already shown stays until the new one has loaded (and been decoded).
 */
export function usePhotoImage(url: string, onError?: () => void): PhotoImage {
  const [state, setState] = useState<PhotoImage>({ status: 'loading' });
  // A notification only: a new callback identity must not reload the image.
  const notify = useRef(onError);
  useEffect(() => {
    notify.current = onError;
  });
  useEffect(() => {
    let live = true;
    const img = new window.Image();
    img.decoding = 'async';
    img.onload = () => {
      // Decoded off the main thread before the stage draws it, so the first frame with the photo does not wait on it.
      const decoded = typeof img.decode === 'function' ? img.decode().catch(() => {}) : Promise.resolve();
      void decoded.then(() => {
        if (live) setState({ status: 'loaded', image: img });
      });
    };
    img.onerror = () => {
      if (!live) return;
      setState((prev) => ({ status: 'error', image: prev.image }));
      notify.current?.();
    };
    img.src = url;
    return () => {
      live = false;
      img.onload = null;
      img.onerror = null;
    };
  }, [url]);
  return state;
}
