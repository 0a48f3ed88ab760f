// The payment stand-in's hosted checkout page in Chromium: a private stand-in on a free port, a
// Checkout Session made with the real SDK, then the page's buttons as a tester clicks them (axe,
// no sideways scrolling, screenshots at 1280 and 390 px). Needs no app: success and cancel URLs
// point at the stand-in's own /health.
import Stripe from "stripe";
import { startPaymentsFake, type PaymentsFake } from "@/lib/payments/fake/server";
import { checkPage, expect, test } from "./page-check";

const KEY = "sk_test_checkout_page_spec";
let fake: PaymentsFake;
let stripe: Stripe;

test.beforeAll(async () => {
  fake = await startPaymentsFake({ port: 0, secretKey: KEY, webhookUrl: null, asyncDelayMs: 3000 });
  // The SDK's host/port/protocol options, as lib/payments/stripe-client.ts sets them (that module is server-only).
  stripe = new Stripe(KEY, { host: "127.0.0.1", port: fake.port, protocol: "http" });
});
test.afterAll(() => fake?.close());

const session = (email?: string) =>
  stripe.checkout.sessions.create({
    mode: "payment",
    line_items: [
      { quantity: 6, price_data: { currency: "eur", unit_amount: 4900, product_data: { name: "Seats: Stage box to mix, class Lantern Room spring" } } },
      { quantity: 1, price_data: { currency: "eur", unit_amount: 1500, product_data: { name: "Printed field guide" } } },
    ],
    success_url: `${fake.url}/health?paid={CHECKOUT_SESSION_ID}`,
    cancel_url: `${fake.url}/health?cancelled=1`,
    ...(email ? { customer_email: email } : {}),
  });

test("shows the order, says a declined card was declined, and pays on to success_url", async ({ page }) => {
  const s = await session();
  await page.goto(s.url!);
  await expect(page.getByRole("heading", { level: 1, name: "Pay for your order" })).toBeVisible();
  const table = page.getByRole("table", { name: "Your order" });
  await expect(table.getByRole("row", { name: /Seats: Stage box to mix.*6.*€49\.00.*€294\.00/ })).toBeVisible();
  // 6 × 49.00 + 1 × 15.00 = 309.00 EUR
  await expect(table.getByRole("row", { name: /Total.*€309\.00/ })).toBeVisible();
  await checkPage(page, "payments-checkout");

  await page.getByLabel("E-mail for the receipt").fill("manager@lantern-school.test");
  await page.getByRole("button", { name: /Pay with a card that is declined/ }).click();
  await expect(page.getByRole("alert")).toContainText("Your card was declined.");
  await checkPage(page, "payments-checkout-declined");
  expect((await stripe.checkout.sessions.retrieve(s.id)).status).toBe("open");

  await page.getByLabel("E-mail for the receipt").fill("manager@lantern-school.test");
  await page.getByRole("button", { name: /^Pay €309\.00/ }).click();
  await expect(page).toHaveURL(`${fake.url}/health?paid=${s.id}`);
  expect(await stripe.checkout.sessions.retrieve(s.id)).toMatchObject({ status: "complete", payment_status: "paid", customer_details: { email: "manager@lantern-school.test" } });
});

test("a delayed method completes unpaid and is paid a moment later; cancel goes back to cancel_url", async ({ page }) => {
  const delayed = await session("apprentice@axisline.test");
  await page.goto(delayed.url!);
  await expect(page.getByText("Receipt to apprentice@axisline.test")).toBeVisible();
  await page.getByRole("button", { name: /^Pay by a delayed method\b(?! that fails)/ }).click();
  await expect(page).toHaveURL(`${fake.url}/health?paid=${delayed.id}`);
  expect((await stripe.checkout.sessions.retrieve(delayed.id)).payment_status).toBe("unpaid");
  await expect.poll(async () => (await stripe.checkout.sessions.retrieve(delayed.id)).payment_status).toBe("paid");

  const left = await session();
  await page.goto(left.url!);
  await page.getByRole("button", { name: /Cancel and go back/ }).click();
  await expect(page).toHaveURL(`${fake.url}/health?cancelled=1`);
  expect((await stripe.checkout.sessions.retrieve(left.id)).status).toBe("open");

  await page.goto(delayed.url!);
  await expect(page.getByRole("heading", { level: 1, name: "This order is paid" })).toBeVisible();
  await checkPage(page, "payments-checkout-paid");
});
