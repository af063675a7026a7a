import { useId, useState, type KeyboardEvent, type RefObject } from 'react';
import { insertMention, matchMembers, mentionQueryAt } from './comment-body';

/**
 * The "@" helper of a comment box: after "@" it offers the members whose names begin with what follows,
 * ↑/↓ move, Enter puts the full name in, Escape closes the list (and nothing else).
 */
export function useMentionPicker<M extends { userId: number; name: string }>(
  members: readonly M[],
  ref: RefObject<HTMLTextAreaElement | null>,
  value: string,
  setValue: (next: string) => void,
) {
  const listId = useId();
  const [at, setAt] = useState<{ start: number; query: string } | null>(null);
  const [active, setActive] = useState(0);
  const options = at ? matchMembers(members, at.query) : [];
  const open = options.length > 0;
  const current = Math.min(active, Math.max(options.length - 1, 0));

  function track(text: string, caret: number) {
    setAt(mentionQueryAt(text, caret));
    setActive(0);
  }

  function pick(member: M) {
    const el = ref.current;
    if (!at || !el) return;
    const caret = at.start + at.query.length + 1;
    const next = insertMention(value, at.start, caret, member.name);
    setValue(next.text);
    setAt(null);
    requestAnimationFrame(() => {
      el.focus();
      el.setSelectionRange(next.caret, next.caret);
    });
  }

  /** Returns true when the key was the list's to handle. */
  function onKeyDown(e: KeyboardEvent<HTMLTextAreaElement>): boolean {
    if (!open) return false;
    const move = (by: number) => setActive((current + by + options.length) % options.length);
    if (e.key === 'ArrowDown') move(1);
    else if (e.key === 'ArrowUp') move(-1);
    else if (e.key === 'Enter' && !e.ctrlKey && !e.metaKey && options[current]) pick(options[current]);
    else if (e.key === 'Escape') {
      e.stopPropagation();
      setAt(null);
    } else return false;
    e.preventDefault();
    return true;
  }

  const optionId = (i: number) => `${listId}-option-${i}`;
  const inputProps = {
    'aria-autocomplete': 'list' as const,
    'aria-controls': open ? listId : undefined,
    'aria-activedescendant': open ? optionId(current) : undefined,
  };
  return {
    open,
    options,
    active: current,
    listId,
    optionId,
    track,
    pick,
    onKeyDown,
    close: () => setAt(null),
    inputProps,
  };
}
