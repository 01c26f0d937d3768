import type { PaymentIntent } from './objects';

/** Everything interpolated into the page goes through here. */
export const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/** Minor units to a display amount, with the currency's own number of decimals (JPY has none). */
export function formatAmount(amount: number, currency: string): string {
  const code = currency.toUpperCase();
  try {
    const format = new Intl.NumberFormat('en-US', { style: 'currency', currency: code });
    const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
    return format.format(amount / 10 ** digits);
  } catch {
    return `${(amount / 100).toFixed(2)} ${code}`;
  }
}

const STYLE = `
  body { font: 16px/1.5 system-ui, sans-serif; background: #f4f5f7; color: #1f2328; margin: 0; }
  main { max-width: 28rem; margin: 4rem auto; background: #fff; border: 1px solid #d0d7de; border-radius: 8px; padding: 2rem; }
  .badge { display: inline-block; background: #fff3cd; color: #664d03; border: 1px solid #ffe69c; border-radius: 4px; padding: 0 .5rem; font-size: .85rem; }
  h1 { font-size: 1.25rem; margin: .75rem 0; }
  .amount { font-size: 2rem; font-weight: 600; margin: .5rem 0 1rem; }
  dl { display: grid; grid-template-columns: auto 1fr; gap: .25rem 1rem; font-size: .9rem; color: #57606a; }
  dd { margin: 0; word-break: break-all; }
  form { display: grid; gap: .75rem; margin-top: 1.5rem; }
  button { font: inherit; padding: .75rem 1rem; border-radius: 6px; border: 1px solid; cursor: pointer; }
  .ok { background: #1f883d; border-color: #1a7f37; color: #fff; }
  .bad { background: #fff; border-color: #cf222e; color: #cf222e; }
  .note { font-size: .85rem; color: #57606a; margin-top: 1.5rem; }
  .error { color: #cf222e; }
`;

function layout(title: string, body: string): string {
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title><style>${STYLE}</style></head>
<body><main><span class="badge">Test mode</span>${body}</main></body></html>`;
}

/** The page with the two buttons; no card field exists, only a choice of Stripe's test outcomes. */
export function paymentPage(intent: PaymentIntent, action: string, returnUrl: string): string {
  const details = `
    <div class="amount">${escapeHtml(formatAmount(intent.amount, intent.currency))}</div>
    <dl><dt>Payment</dt><dd>${escapeHtml(intent.id)}</dd>
    ${intent.description ? `<dt>For</dt><dd>${escapeHtml(intent.description)}</dd>` : ''}
    <dt>Status</dt><dd>${escapeHtml(intent.status)}</dd></dl>`;
  const error = intent.last_payment_error
    ? `<p class="error" role="alert">Last attempt: ${escapeHtml(intent.last_payment_error.message)}</p>`
    : '';
  const payable = intent.status === 'requires_payment_method';
  const form = payable
    ? `<form method="post" action="${escapeHtml(action)}">
        <input type="hidden" name="return_url" value="${escapeHtml(returnUrl)}">
        <button class="ok" type="submit" name="outcome" value="succeed">Pay with a test card that succeeds</button>
        <button class="bad" type="submit" name="outcome" value="decline">Pay with a test card that is declined</button>
      </form>`
    : `<p>This payment cannot be paid now (status ${escapeHtml(intent.status)}).</p>
       <p><a href="${escapeHtml(returnUrl)}">Return to the shop</a></p>`;
  return layout(
    'Test payment (local stand-in)',
    `<h1>Test payment (local stand-in)</h1>${details}${error}${form}
     <p class="note">This page stands in for Stripe's payment page in local runs. No card details are asked for or sent;
     the buttons choose one of Stripe's test payment methods.</p>`,
  );
}

export function messagePage(title: string, message: string): string {
  return layout(title, `<h1>${escapeHtml(title)}</h1><p class="error">${escapeHtml(message)}</p>`);
}
