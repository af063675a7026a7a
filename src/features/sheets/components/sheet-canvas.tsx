import { createContext, useContext, type ComponentType } from 'react';
import type { NewMark } from '../../../lib/new-mark';
import type { PictureCanvasProps } from '../../../lib/picture-canvas';

/** What the reference views ask of a picture canvas: the picture, its marks drawn as findings, and the callbacks. */
export interface SheetCanvasProps extends PictureCanvasProps {
  onCreate(geometry: NewMark): Promise<number | undefined>;
  onMove(id: number, points: { x: number; y: number }[]): void;
  onDelete(id: number): void;
}

const SheetCanvasContext = createContext<ComponentType<SheetCanvasProps> | undefined>(undefined);

/** The app layer supplies the canvas (the markup canvas), so sheets need not import the markup feature. */
export const SheetCanvasProvider = SheetCanvasContext.Provider;

export function SheetCanvas(props: SheetCanvasProps) {
  const Canvas = useContext(SheetCanvasContext);
  if (!Canvas) throw new Error('No canvas for the reference view: wrap it in SheetCanvasProvider (src/app).');
  return <Canvas {...props} />;
}

/** What a reference view decides about its canvas; the rest is the same for every reference view. */
export type ReferenceCanvasProps = Pick<
  SheetCanvasProps,
  'imageUrl' | 'imageSize' | 'items' | 'selectedId' | 'focusId' | 'onSelect' | 'onCreate' | 'onImageError' | 'label'
> & {
  /** May place new marks (a technician). */
  canMark: boolean;
  /** Removes a mark; without it, marks stay. */
  onDelete?: (id: number) => void;
};

/**
 * A picture with reference marks: zoomed onto `focusId` for every reader; marks are placed or removed, never moved
 * or edited (a mark that is wrong is removed and placed again).
 */
export function ReferenceCanvas({ canMark, onDelete = () => {}, ...props }: ReferenceCanvasProps) {
  return (
    <SheetCanvas
      {...props}
      focusWhenReading
      canCreate={canMark}
      canEdit={() => false}
      onMove={() => {}}
      onDelete={onDelete}
    />
  );
}
