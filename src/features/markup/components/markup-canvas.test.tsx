// @vitest-environment happy-dom
import 'vitest-canvas-mock';
import '@testing-library/jest-dom/vitest';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { makeFinding } from '../../../testing/finding-fixtures';
import { MarkupCanvas, type MarkupCanvasProps } from './markup-canvas';

// The stage measures 800×600 at the viewport's top-left; the photo is 4000×3000, so "Fit" (16 px clear all round) is 568/3000 = 19 %.
beforeEach(() => {
  vi.spyOn(HTMLElement.prototype, 'getBoundingClientRect').mockReturnValue(
    DOMRect.fromRect({ x: 0, y: 0, width: 800, height: 600 }),
  );
});
afterEach(() => {
  cleanup();
  vi.restoreAllMocks();
});

const items = [
  makeFinding(1, { points: [{ x: 0.5, y: 0.5 }] }),
  makeFinding(2, {
    shape: 'rect',
    points: [
      { x: 0.1, y: 0.1 },
      { x: 0.2, y: 0.2 },
    ],
  }),
];

function renderCanvas(overrides: Partial<MarkupCanvasProps> = {}) {
  const props: MarkupCanvasProps = {
    imageUrl: '/d/11.webp',
    imageSize: { width: 4000, height: 3000 },
    items,
    canCreate: true,
    canEdit: () => true,
    onSelect: vi.fn(),
    onCreate: vi.fn(),
    onMove: vi.fn(),
    onDelete: vi.fn(),
    ...overrides,
  };
  const utils = render(<MarkupCanvas {...props} />);
  return {
    ...utils,
    props,
    user: userEvent.setup(),
    stage: screen.getByTestId('markup-stage'),
    zoom: () => screen.getByRole('status', { name: 'Zoom level' }),
  };
}

describe('MarkupCanvas toolbar', () => {
  it('when a tool letter is pressed on the canvas, then that tool is pressed and the others are not', async () => {
    const { user, stage } = renderCanvas();
    expect(screen.getByRole('button', { name: 'Select' })).toHaveAttribute('aria-pressed', 'true');
    stage.focus();
    await user.keyboard('p');
    expect(screen.getByRole('button', { name: 'Pin' })).toHaveAttribute('aria-pressed', 'true');
    expect(screen.getByRole('button', { name: 'Select' })).toHaveAttribute('aria-pressed', 'false');
    await user.keyboard('r');
    expect(screen.getByRole('button', { name: 'Rectangle' })).toHaveAttribute('aria-pressed', 'true');
    expect(screen.getByRole('button', { name: 'Rectangle' })).toHaveAttribute('aria-keyshortcuts', 'R');
  });

  it('when the toolbar has focus, then it is one Tab stop, arrows move along it and Enter picks a tool', async () => {
    const { user } = renderCanvas();
    await user.tab();
    expect(screen.getByRole('button', { name: 'Select' })).toHaveFocus();
    await user.keyboard('{ArrowRight}{ArrowRight}');
    expect(screen.getByRole('button', { name: 'Circle' })).toHaveFocus();
    await user.keyboard('{Enter}');
    expect(screen.getByRole('button', { name: 'Circle' })).toHaveAttribute('aria-pressed', 'true');
    await user.keyboard('{End}');
    expect(screen.getByRole('button', { name: 'Freehand' })).toHaveFocus();
    await user.tab();
    expect(screen.getByRole('button', { name: 'Circle' })).not.toHaveFocus();
    expect(screen.getByRole('toolbar', { name: 'Markup tools' })).not.toContainElement(
      document.activeElement as HTMLElement,
    );
  });

  it('when the person may not create findings, then only Select is offered and drawing keys do nothing', async () => {
    const { user, stage } = renderCanvas({ canCreate: false });
    expect(screen.getAllByRole('button', { pressed: true }).map((b) => b.textContent)).toEqual(['SelectV']);
    expect(screen.queryByRole('button', { name: 'Pin' })).not.toBeInTheDocument();
    stage.focus();
    await user.keyboard('p');
    expect(screen.getByRole('button', { name: 'Select' })).toHaveAttribute('aria-pressed', 'true');
  });
});

describe('MarkupCanvas read-only', () => {
  it('when the person may neither place nor change marks, then there are no tools, Undo or Keys, and a finding opened by URL leaves the photo at Fit', () => {
    const { zoom } = renderCanvas({ canCreate: false, canEdit: () => false, focusId: 1, selectedId: 1 });
    expect(screen.queryByRole('button', { name: 'Select' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Undo/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Keys/ })).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Fit' })).toBeInTheDocument();
    // Fit, worked by hand above: (600 − 2 × 16) / 3000 = 19 %.
    expect(zoom()).toHaveTextContent('19 %');
  });

  it("when a reader's canvas is asked to zoom onto a part, then it zooms past Fit onto it, still without tools", async () => {
    const { zoom } = renderCanvas({
      canCreate: false,
      canEdit: () => false,
      focusId: 2,
      selectedId: 2,
      focusWhenReading: true,
    });
    expect(screen.queryByRole('button', { name: 'Select' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Undo/ })).not.toBeInTheDocument();
    // Finding 2 is a box of 400 × 300 photo px; a focused box fills half the 800 × 600 stage, worked by hand:
    // min(800 × 0.5 / 400, 600 × 0.5 / 300) = 1, so 100 % (Fit would be 19 %).
    await waitFor(() => expect(zoom()).toHaveTextContent('100 %'));
  });
});

describe('MarkupCanvas help and zoom', () => {
  it('when ? is pressed, then the keys panel opens from the key map, and Escape closes it back to the canvas', async () => {
    const { user, stage } = renderCanvas();
    stage.focus();
    await user.keyboard('?');
    const help = screen.getByRole('dialog', { name: 'Keys and gestures' });
    expect(help).toHaveTextContent('Place a pin');
    expect(help).toHaveTextContent('Nudge by ten photo pixels');
    await user.keyboard('{Escape}');
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(stage).toHaveFocus();
  });

  it('when zoomed with the buttons and the keys, then the readout follows, and Fit and Actual size set it', async () => {
    const { user, stage, zoom } = renderCanvas();
    expect(zoom()).toHaveTextContent('19 %');
    await user.click(screen.getByRole('button', { name: 'Zoom in' }));
    expect(zoom()).toHaveTextContent('24 %');
    stage.focus();
    await user.keyboard('-');
    expect(zoom()).toHaveTextContent('19 %');
    await user.keyboard('-');
    expect(zoom()).toHaveTextContent('15 %');
    await user.click(screen.getByRole('button', { name: 'Actual size' }));
    expect(zoom()).toHaveTextContent('100 %');
    stage.focus();
    await user.keyboard('0');
    expect(zoom()).toHaveTextContent('19 %');
    expect(window.__gridleakMarkup?.view.scale).toBeCloseTo(568 / 3000, 6);
    expect(window.__gridleakMarkup?.imageToClient(0.5, 0.5)).toEqual({ x: 400, y: 300 });
  });

  it('when the wheel turns over the stage, then it zooms in around the pointer', () => {
    const { stage, zoom } = renderCanvas();
    fireEvent.wheel(stage, { deltaY: -100, clientX: 100, clientY: 100 });
    expect(zoom()).not.toHaveTextContent('19 %');
    expect(window.__gridleakMarkup?.view.scale).toBeGreaterThan(568 / 3000);
  });
});

describe('MarkupCanvas editing', () => {
  const press = (el: HTMLElement, x: number, y: number) => {
    fireEvent.pointerDown(el, { pointerId: 1, button: 0, pointerType: 'mouse', clientX: x, clientY: y });
    fireEvent.pointerUp(el, { pointerId: 1, button: 0, pointerType: 'mouse', clientX: x, clientY: y });
  };

  it('when the pin tool clicks the photo, then a pin is offered to the page where it was clicked', async () => {
    const { user, stage, props } = renderCanvas();
    await user.click(screen.getByRole('button', { name: 'Pin' }));
    press(stage, 400, 300);
    expect(props.onCreate).toHaveBeenCalledTimes(1);
    const [mark] = vi.mocked(props.onCreate).mock.calls[0] ?? [];
    expect(mark?.shape).toBe('pin');
    expect(mark?.points[0]?.x).toBeCloseTo(0.5, 9);
    expect(mark?.points[0]?.y).toBeCloseTo(0.5, 9);
  });

  it('when a pin is clicked with Select, then it is selected; a click on empty photo clears the selection', () => {
    const { stage, props } = renderCanvas({ selectedId: 1 });
    press(stage, 405, 298);
    expect(props.onSelect).toHaveBeenLastCalledWith(1);
    press(stage, 700, 500);
    expect(props.onSelect).toHaveBeenLastCalledWith(undefined);
  });

  it('when the selected pin is nudged and the nudge undone, then the page is sent the moved and then the original points', async () => {
    const { user, stage, props } = renderCanvas({ selectedId: 1 });
    stage.focus();
    await user.keyboard('{Shift>}{ArrowRight}{/Shift}');
    expect(props.onMove).toHaveBeenLastCalledWith(1, [{ x: 0.5 + 10 / 4000, y: 0.5 }]);
    await user.keyboard('{Control>}z{/Control}');
    expect(props.onMove).toHaveBeenLastCalledWith(1, [{ x: 0.5, y: 0.5 }]);
  });

  it('when Delete is pressed on the selected finding, then it asks first and deletes only when confirmed', async () => {
    const { user, stage, props } = renderCanvas({ selectedId: 1 });
    stage.focus();
    await user.keyboard('{Delete}');
    const asked = await screen.findByRole('dialog', { name: /^Delete finding #/ });
    await user.click(within(asked).getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(props.onDelete).not.toHaveBeenCalled();
    expect(stage).toHaveFocus();
    await user.keyboard('{Backspace}');
    await user.click(within(await screen.findByRole('dialog')).getByRole('button', { name: 'Delete finding' }));
    await waitFor(() => expect(props.onDelete).toHaveBeenCalledWith(1));
  });

  it('when the finding may not be edited, then Delete and the arrows leave it alone, and Escape deselects', async () => {
    const { user, stage, props } = renderCanvas({ selectedId: 1, canEdit: () => false });
    stage.focus();
    await user.keyboard('{Delete}{ArrowLeft}');
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(props.onMove).not.toHaveBeenCalled();
    await user.keyboard('{Escape}');
    expect(props.onSelect).toHaveBeenCalledWith(undefined);
  });
});

describe('MarkupCanvas from the keyboard alone', () => {
  it('when the photo gets focus, P and Enter, then a crosshair shows where it is and a pin is offered there', async () => {
    const { user, props } = renderCanvas({ onCreate: vi.fn().mockResolvedValue(99) });
    // Tab past the toolbar, Undo, Keep tool, the zoom controls, Legend and Keys, onto the photo.
    while (document.activeElement !== screen.getByTestId('markup-stage')) await user.tab();
    expect(screen.getByTestId('markup-crosshair')).toBeInTheDocument();
    expect(screen.getByTestId('markup-crosshair-position')).toHaveTextContent('50 % across, 50 % down, near #1');
    await user.keyboard('p{Enter}');
    const [pin] = vi.mocked(props.onCreate).mock.calls[0] ?? [];
    expect(pin?.shape).toBe('pin');
    expect(pin?.points[0]?.x).toBeCloseTo(0.5, 9);
    expect(pin?.points[0]?.y).toBeCloseTo(0.5, 9);
    // Once saved, the tool goes back to Select.
    await waitFor(() => expect(screen.getByRole('button', { name: 'Select' })).toHaveAttribute('aria-pressed', 'true'));
  });

  it('when a box is started with Enter, moved with Shift+arrows and finished with Enter, then that box is offered', async () => {
    const { user, stage, props } = renderCanvas();
    stage.focus();
    await user.keyboard('r{Enter}{Shift>}{ArrowRight}{ArrowDown}{/Shift}');
    expect(screen.getByTestId('markup-crosshair-position')).toHaveTextContent(/Enter finishes it/);
    await user.keyboard('{Enter}');
    const [mark] = vi.mocked(props.onCreate).mock.calls[0] ?? [];
    expect(mark?.shape).toBe('rect');
    // 48 stage px at 568/3000 stage px per image px, as a share of the photo's 4000 × 3000 px.
    expect(mark!.points[1]!.x - mark!.points[0]!.x).toBeCloseTo(48 / (568 / 3000) / 4000, 9);
    expect(mark!.points[1]!.y - mark!.points[0]!.y).toBeCloseTo(48 / (568 / 3000) / 3000, 9);
  });

  it('when Keep tool is ticked, then the tool stays after a finding is saved, and the choice is remembered', async () => {
    localStorage.removeItem('gridleak.markup.keep-tool');
    const { user, stage, unmount } = renderCanvas({ onCreate: vi.fn().mockResolvedValue(99) });
    await user.click(screen.getByRole('checkbox', { name: 'Keep tool' }));
    stage.focus();
    await user.keyboard('p{Enter}');
    await Promise.resolve();
    expect(screen.getByRole('button', { name: 'Pin' })).toHaveAttribute('aria-pressed', 'true');
    unmount();
    renderCanvas();
    expect(screen.getByRole('checkbox', { name: 'Keep tool' })).toBeChecked();
    localStorage.removeItem('gridleak.markup.keep-tool');
  });
});
