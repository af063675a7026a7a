import type { Meta } from '../../../../shared/schemas/meta';

type Account = Meta['demoAccounts'][number];

/** Demo mode only: the invented workshop's accounts, one click to fill the form. */
export function DemoAccounts({ accounts, onPick }: { accounts: Account[]; onPick: (a: Account) => void }) {
  if (!accounts.length) return null;
  return (
    <section
      aria-labelledby="demo-accounts"
      className="mt-5 rounded-xl border border-dashed border-glow/60 bg-glow-soft/50 p-4"
    >
      <h2 id="demo-accounts" className="font-bold">
        Demo workshop
      </h2>
      <p className="text-sm text-ink-soft">
        Invented people for trying Gridleak. Password for each:{' '}
        <code className="font-mono">{accounts[0]!.password}</code>
      </p>
      <ul className="mt-2 space-y-1">
        {accounts.map((a) => (
          <li key={a.email}>
            <button
              type="button"
              onClick={() => onPick(a)}
              className="min-h-11 w-full rounded-lg px-2 text-left hover:bg-panel"
            >
              <span className="font-semibold">{a.name}</span>{' '}
              <span className="text-sm text-ink-soft">
                · {a.role} · {a.email}
              </span>
            </button>
          </li>
        ))}
      </ul>
    </section>
  );
}
