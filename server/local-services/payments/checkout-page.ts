import { formatMoney } from '../../../shared/money/currency';
import type { FakeSession } from './payment-fake-state';

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

function amountText(s: FakeSession) {
  return formatMoney({ amount: s.amount_total, currency: s.currency.toUpperCase() }, 'en-GB');
}

/** The local test payment page: what a hosted checkout shows, with the three outcomes as buttons. */
export function checkoutPage(s: FakeSession, notice = ''): string {
  const open = s.status === 'open';
  const button = (action: string, label: string, hint: string, style: string) =>
    `<form method="post" action="/checkout/${escape(s.id)}/${action}"><button type="submit" style="${style}" aria-describedby="${action}-hint">${label}</button><p id="${action}-hint" class="hint">${hint}</p></form>`;
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Local test payment page</title>
<style>
body{margin:0;font:16px/1.5 system-ui,sans-serif;background:#f4efe4;color:#2b211a}
main{max-width:32rem;margin:3rem auto;padding:1.5rem;background:#fffdf8;border:2px solid #6b4b32;border-radius:12px}
h1{font-size:1.4rem;margin:0 0 .25rem}.amount{font-size:2rem;font-weight:700;margin:.5rem 0}
.banner{background:#2b211a;color:#fbe3b4;padding:.5rem .75rem;border-radius:8px;font-weight:600}
button{font:inherit;font-weight:700;padding:.6rem 1.2rem;border-radius:8px;cursor:pointer;min-width:8rem}
button:focus-visible{outline:3px solid #1d4ed8;outline-offset:2px}.hint{margin:.25rem 0 1rem;color:#4a3b2e;font-size:.9rem}
[role=status]{font-weight:600}
</style></head>
<body><main>
<p class="banner">Local test payment page: no card is asked for and no money moves.</p>
<h1>${escape(s.line_name)}</h1>
<p class="amount">${escape(amountText(s))}</p>
${notice ? `<p role="status">${escape(notice)}</p>` : ''}
${
  open
    ? button('pay', 'Pay', 'The payment succeeds.', 'background:#a4481b;color:#fff;border:2px solid #7a3310') +
      button(
        'decline',
        'Decline',
        'The bank declines the payment after checkout; nothing is paid.',
        'background:#fff;color:#2b211a;border:2px solid #2b211a',
      ) +
      button('cancel', 'Cancel', 'Go back without paying.', 'background:#fff;color:#2b211a;border:2px solid #6b4b32')
    : `<p>This checkout is ${s.status === 'complete' ? 'finished' : 'closed'}.</p>`
}
</main></body></html>`;
}
