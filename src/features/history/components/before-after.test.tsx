// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it } from 'vitest';
import { makePhoto } from '../../../testing/photo-fixtures';
import { BeforeAfter } from './before-after';

afterEach(cleanup);

const before = makePhoto(1, { view: 'underside', phase: 'before', caption: 'wax capacitors' });
const after = makePhoto(2, { view: 'underside', phase: 'after', caption: 'recapped' });

describe('before and after', () => {
  it('when the handle is moved with the arrow keys, then aria-valuenow follows and the after photo is cut there', async () => {
    const user = userEvent.setup();
    render(<BeforeAfter before={before} after={after} />);
    const slider = screen.getByRole('slider', { name: 'Before and after comparison' });
    expect(slider).toHaveAttribute('aria-valuenow', '50');

    slider.focus();
    await user.keyboard('{ArrowRight}');
    expect(slider).toHaveAttribute('aria-valuenow', '55');
    expect(slider).toHaveAttribute('aria-valuetext', '55% before, 45% after');
    expect(screen.getByRole('img', { name: 'After — Underside, after: recapped' }).style.clipPath).toBe(
      'inset(0 0 0 55%)',
    );

    await user.keyboard('{ArrowLeft}{ArrowLeft}{ArrowLeft}');
    expect(slider).toHaveAttribute('aria-valuenow', '40');
    await user.keyboard('{Home}{ArrowLeft}');
    expect(slider).toHaveAttribute('aria-valuenow', '0');
    await user.keyboard('{End}');
    expect(slider).toHaveAttribute('aria-valuenow', '100');
  });

  it('when the picture is pressed and dragged, then the divider follows the mouse or finger', () => {
    render(<BeforeAfter before={before} after={after} />);
    const slider = screen.getByRole('slider', { name: 'Before and after comparison' });
    const picture = slider.parentElement as HTMLElement;
    picture.getBoundingClientRect = () => ({
      left: 100,
      top: 0,
      width: 400,
      height: 300,
      right: 500,
      bottom: 300,
      x: 100,
      y: 0,
      toJSON: () => ({}),
    });

    fireEvent.pointerDown(picture, { clientX: 400, pointerId: 1, pointerType: 'mouse', button: 0 });
    expect(slider).toHaveAttribute('aria-valuenow', '75');
    fireEvent.pointerMove(picture, { clientX: 140, pointerId: 1, pointerType: 'mouse' });
    expect(slider).toHaveAttribute('aria-valuenow', '10');
    fireEvent.pointerUp(picture, { clientX: 140, pointerId: 1, pointerType: 'mouse' });
    fireEvent.pointerMove(picture, { clientX: 500, pointerId: 1, pointerType: 'mouse' });
    expect(slider).toHaveAttribute('aria-valuenow', '10');

    // A finger only moves the divider once it slides, so a scroll that starts on the picture leaves it be.
    fireEvent.pointerDown(picture, { clientX: 300, pointerId: 2, pointerType: 'touch' });
    expect(slider).toHaveAttribute('aria-valuenow', '10');
    fireEvent.pointerMove(picture, { clientX: 320, pointerId: 2, pointerType: 'touch' });
    expect(slider).toHaveAttribute('aria-valuenow', '55');
    fireEvent.pointerCancel(picture, { pointerId: 2, pointerType: 'touch' });
  });

  it('when "Side by side" is pressed, then both photos show whole and the slider goes', async () => {
    const user = userEvent.setup();
    render(<BeforeAfter before={before} after={after} />);
    await user.click(screen.getByRole('button', { name: 'Side by side' }));
    expect(screen.getByRole('button', { name: 'Side by side' })).toHaveAttribute('aria-pressed', 'true');
    expect(screen.queryByRole('slider')).not.toBeInTheDocument();
    expect(screen.getByRole('img', { name: 'Before — Underside, before: wax capacitors' })).toHaveAttribute(
      'srcset',
      expect.stringContaining('/d/1.webp '),
    );
    expect(screen.getByRole('img', { name: 'After — Underside, after: recapped' })).toHaveAttribute(
      'srcset',
      expect.stringContaining('/d/2.webp '),
    );
  });
});
