import type { ReactNode } from 'react';
import { MarkupCanvas } from '../../features/markup/components/markup-canvas';
import { SheetCanvasProvider } from '../../features/sheets/components/sheet-canvas';

/** The reference views of sheets draw their pictures and marks on the markup canvas. */
export function WithMarkupCanvas({ children }: { children: ReactNode }) {
  return <SheetCanvasProvider value={MarkupCanvas}>{children}</SheetCanvasProvider>;
}
