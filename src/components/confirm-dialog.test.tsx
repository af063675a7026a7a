// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { useConfirm } from './use-confirm';

afterEach(cleanup);

function Asker({ onResult }: { onResult: (yes: boolean) => void }) {
  const { confirm, dialog } = useConfirm();
  return (
    <div>
      <button
        type="button"
        onClick={() =>
          void confirm({
            title: 'Remove Ida Kettle?',
            consequence: 'She can no longer open this restoration.',
            confirmLabel: 'Remove member',
            danger: true,
          }).then(onResult)
        }
      >
        Remove
      </button>
      <button type="button">Elsewhere on the page</button>
      {dialog}
    </div>
  );
}

describe('confirmation dialog', () => {
  it('when it opens, then it is a modal dialog named by its question, with the consequence in words, and focus on the safe answer', async () => {
    const user = userEvent.setup();
    render(<Asker onResult={vi.fn()} />);
    await user.click(screen.getByRole('button', { name: 'Remove' }));
    const dialog = screen.getByRole('dialog', { name: 'Remove Ida Kettle?' });
    expect(dialog).toHaveAttribute('open');
    expect(dialog).toHaveAccessibleDescription('She can no longer open this restoration.');
    expect(within(dialog).getByRole('button', { name: 'Cancel' })).toHaveFocus();
  });

  it('when Tab and Shift+Tab are pressed, then focus goes round inside the dialog and never reaches the page', async () => {
    const user = userEvent.setup();
    render(<Asker onResult={vi.fn()} />);
    await user.click(screen.getByRole('button', { name: 'Remove' }));
    const dialog = screen.getByRole('dialog');
    const cancel = within(dialog).getByRole('button', { name: 'Cancel' });
    const yes = within(dialog).getByRole('button', { name: 'Remove member' });
    await user.tab();
    expect(yes).toHaveFocus();
    await user.tab();
    expect(cancel).toHaveFocus();
    await user.tab({ shift: true });
    expect(yes).toHaveFocus();
    await user.tab({ shift: true });
    expect(cancel).toHaveFocus();
    expect(screen.getByRole('button', { name: 'Elsewhere on the page' })).not.toHaveFocus();
  });

  it('when Escape is pressed, then it closes, answers no, and focus returns to the button that opened it', async () => {
    const user = userEvent.setup();
    const onResult = vi.fn();
    render(<Asker onResult={onResult} />);
    const opener = screen.getByRole('button', { name: 'Remove' });
    await user.click(opener);
    await user.keyboard('{Escape}');
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(onResult).toHaveBeenCalledWith(false);
    expect(opener).toHaveFocus();
  });

  it('when the action is confirmed, then it answers yes once and closes', async () => {
    const user = userEvent.setup();
    const onResult = vi.fn();
    render(<Asker onResult={onResult} />);
    await user.click(screen.getByRole('button', { name: 'Remove' }));
    await user.click(screen.getByRole('button', { name: 'Remove member' }));
    expect(onResult).toHaveBeenCalledExactlyOnceWith(true);
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
  });
});
