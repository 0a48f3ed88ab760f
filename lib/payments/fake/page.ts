// The stand-in's hosted checkout page (a Checkout Session's `url`): plain server-rendered HTML of
// our own simple design. It shows the order and offers the outcomes a tester needs; each button
// POSTs to /checkout/<id>/<outcome> and the answer is a 303 to where the buyer goes next.
import type { StoredSession } from "./store";

const ESCAPES: Record<string, string> = { "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" };
const esc = (s: string) => s.replace(/[&<>"']/g, (c) => ESCAPES[c]);

// Currencies without minor units (docs.stripe.com/currencies, "Zero-decimal currencies").
const ZERO_DECIMAL = new Set(["bif", "clp", "djf", "gnf", "jpy", "kmf", "krw", "mga", "pyg", "rwf", "ugx", "vnd", "vuv", "xaf", "xof", "xpf"]);

/** 123456 eur → "€1,234.56" (minor units to the currency's display). */
export function formatMoney(minor: number, currency: string): string {
  const major = ZERO_DECIMAL.has(currency) ? minor : minor / 100;
  return new Intl.NumberFormat("en-GB", { style: "currency", currency: currency.toUpperCase() }).format(major);
}

const STYLE = `
  :root { color-scheme: light; font-family: system-ui, sans-serif; line-height: 1.5; color: #1b1f24; background: #f4f5f2; }
  body { margin: 0; }
  main { max-width: 40rem; margin: 0 auto; padding: 1.5rem 1rem 3rem; }
  .banner { background: #fff6d6; border: 1px solid #8a6d00; padding: .5rem .75rem; border-radius: .375rem; font-size: .9rem; }
  h1 { font-size: 1.6rem; margin: 1rem 0 .25rem; }
  h2 { font-size: 1.1rem; margin: 0 0 .5rem; }
  section { background: #fff; border: 1px solid #c9ccc4; border-radius: .5rem; padding: 1rem; margin-top: 1rem; }
  table { width: 100%; border-collapse: collapse; }
  /* The table's name for assistive technology; the section heading above says it visibly. */
  caption { position: absolute; width: 1px; height: 1px; overflow: hidden; clip-path: inset(50%); white-space: nowrap; }
  section { position: relative; }
  @media (max-width: 30rem) { th, td { padding: .35rem .15rem; font-size: .95rem; } }
  th, td { padding: .4rem .25rem; border-bottom: 1px solid #e1e3dd; text-align: left; vertical-align: top; }
  td.num, th.num { text-align: right; white-space: nowrap; }
  tfoot th, tfoot td { border-bottom: 0; font-weight: 700; }
  label { display: block; font-weight: 600; margin-bottom: .25rem; }
  input { font: inherit; width: 100%; box-sizing: border-box; padding: .5rem; border: 1px solid #5d6359; border-radius: .375rem; }
  .actions { display: grid; gap: .5rem; margin-top: 1rem; }
  button { font: inherit; padding: .65rem 1rem; border-radius: .375rem; border: 2px solid #23415f; background: #fff; color: #23415f; cursor: pointer; text-align: left; }
  button.primary { background: #23415f; color: #fff; font-weight: 600; }
  button:focus-visible, input:focus-visible, a:focus-visible { outline: 3px solid #b35c00; outline-offset: 2px; }
  .hint { display: block; font-size: .85rem; font-weight: 400; }
  .notice { border: 2px solid #a3261b; color: #7d1d14; background: #fdeeec; padding: .5rem .75rem; border-radius: .375rem; margin-top: 1rem; }
  a { color: #23415f; }
`;

function layout(title: string, body: string): string {
  return `<!doctype html>
<html lang="en">
<head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><link rel="icon" href="data:,"><title>${esc(title)}</title><style>${STYLE}</style></head>
<body><main>
<p class="banner">Local payment stand-in for testing: no real money moves and no card details are asked for.</p>
${body}
</main></body></html>`;
}

function orderTable(stored: StoredSession): string {
  const s = stored.session;
  const rows = stored.lineItems.map((li) => {
    const price = li.price as { unit_amount: number };
    return `<tr><td>${esc(String(li.description))}</td><td class="num">${li.quantity}</td><td class="num">${formatMoney(price.unit_amount, s.currency)}</td><td class="num">${formatMoney(li.amount_total as number, s.currency)}</td></tr>`;
  });
  return `<table>
<caption>Your order</caption>
<thead><tr><th scope="col">Item</th><th scope="col" class="num">Quantity</th><th scope="col" class="num">Unit price</th><th scope="col" class="num">Amount</th></tr></thead>
<tbody>${rows.join("")}</tbody>
<tfoot><tr><th scope="row" colspan="3">Total</th><td class="num">${formatMoney(s.amount_total, s.currency)}</td></tr></tfoot>
</table>`;
}

export function checkoutPage(stored: StoredSession): string {
  const s = stored.session;
  const id = esc(s.id);
  if (s.status === "complete") {
    const next = s.success_url?.replaceAll("{CHECKOUT_SESSION_ID}", s.id);
    return layout("Order paid · Checkout", `<h1>This order is paid</h1><section>${orderTable(stored)}</section>${next ? `<p><a href="${esc(next)}">Return to the shop</a></p>` : ""}`);
  }
  if (s.status === "expired") {
    return layout("Checkout expired · Checkout", `<h1>This checkout has expired</h1><p>Nothing was charged. Go back to the shop and start again.</p>`);
  }
  const notice = stored.notice ? `<p class="notice" role="alert">${esc(stored.notice)} Nothing was charged. Try again or choose another way to pay.</p>` : "";
  const email = s.customer_email
    ? `<p>Receipt to <strong>${esc(s.customer_email)}</strong></p>`
    : `<label for="email">E-mail for the receipt</label><input id="email" name="email" type="email" autocomplete="email" required>`;
  const total = formatMoney(s.amount_total, s.currency);
  const button = (outcome: string, label: string, hint: string, primary = false) =>
    `<button type="submit" formaction="/checkout/${id}/${outcome}"${primary ? ' class="primary"' : ""}${outcome === "abandon" ? " formnovalidate" : ""}>${label}<span class="hint">${hint}</span></button>`;
  return layout(`Pay ${total} · Checkout`, `<h1>Pay for your order</h1>
<section aria-labelledby="order-heading"><h2 id="order-heading">Order summary</h2>${orderTable(stored)}</section>
${notice}
<section aria-labelledby="pay-heading"><h2 id="pay-heading">Payment</h2>
<form method="post" action="/checkout/${id}/pay">
${email}
<div class="actions">
${button("pay", `Pay ${total}`, "The payment succeeds at once.", true)}
${button("decline", "Pay with a card that is declined", "The page says the card was declined; nothing is charged.")}
${button("delay", "Pay by a delayed method", "Accepted now, confirmed as paid a few seconds later.")}
${button("delay-fail", "Pay by a delayed method that fails", "Accepted now, reported as failed a few seconds later.")}
${button("abandon", "Cancel and go back", "Leaves the checkout open until it expires; nothing is charged.")}
</div>
</form></section>`);
}

export function notFoundPage(): string {
  return layout("Checkout not found", `<h1>Checkout not found</h1><p>This checkout link is not valid. Go back to the shop and start again.</p>`);
}

export function messagePage(title: string, message: string): string {
  return layout(title, `<h1>${esc(title)}</h1><p>${esc(message)}</p>`);
}
