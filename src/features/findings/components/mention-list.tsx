import { roleLabels, type Role } from '../../../../shared/permissions';

/** The members offered after "@", as a listbox tied to the comment box by aria-activedescendant. */
export function MentionList<M extends { userId: number; name: string; role: Role }>({
  id,
  options,
  active,
  optionId,
  onPick,
}: {
  id: string;
  options: M[];
  active: number;
  optionId: (i: number) => string;
  onPick: (m: M) => void;
}) {
  return (
    <ul
      id={id}
      role="listbox"
      aria-label="Members to mention"
      className="absolute z-10 mt-1 w-64 overflow-hidden rounded-lg border border-rule bg-panel shadow-lg"
    >
      {options.map((m, i) => (
        <li
          key={m.userId}
          id={optionId(i)}
          role="option"
          aria-selected={i === active}
          // Keep focus in the text box: pick on mouse down, before it would blur.
          onMouseDown={(e) => {
            e.preventDefault();
            onPick(m);
          }}
          className={`flex min-h-11 cursor-pointer items-center justify-between gap-2 px-3 ${i === active ? 'bg-glow-soft text-glow-strong' : 'hover:bg-sunken'}`}
        >
          <span className="font-semibold">{m.name}</span>
          <span className="text-xs text-ink-soft">{roleLabels[m.role]}</span>
        </li>
      ))}
    </ul>
  );
}
