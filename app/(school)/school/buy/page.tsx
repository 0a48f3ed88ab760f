import { randomBytes } from "node:crypto";
import type { Metadata } from "next";
import Link from "next/link";
import { SchoolBuyForm } from "@/components/purchase/school-buy-form";
import { Notice } from "@/components/ui/notice";
import { Table, TableBody, TableCell, TableHead, TableHeaderCell, TableRow } from "@/components/ui/table";
import { CURRENCY, formatMoney, quoteSchoolOrder, SCHOOL_TIERS } from "@/lib/pricing/prices";
import { getPurchaseOptions } from "@/lib/server/orders";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";
import { buySeatsAction } from "./actions";

export const metadata: Metadata = { title: "Buy seats" };

type Search = { class?: string | string[]; cancelled?: string | string[] };

export default async function BuySeatsPage({ searchParams }: { searchParams: Promise<Search> }) {
  const viewer = await requirePageViewer("/school/buy", "school_manager");
  const { options } = pageData(await getPurchaseOptions(viewer));
  const search = await searchParams;
  const preselect = typeof search.class === "string" ? search.class : undefined;
  // A fresh nonce per rendering of the form: the idempotency key of its order (lib/server/purchases.ts).
  const nonce = randomBytes(18).toString("base64url");
  return (
    <div className="space-y-8">
      <nav aria-label="Breadcrumb" className="text-body-sm">
        <Link href="/school">School office</Link> <span aria-hidden="true">›</span> <span aria-current="page">Buy seats</span>
      </nav>
      <h1 className="text-3xl font-bold">Buy seats</h1>
      {search.cancelled ? (
        <Notice tone="note" title="Payment not completed" announce>
          <p>You left the payment page before paying. Nothing was charged; you can start again below.</p>
        </Notice>
      ) : null}
      {options.schools.length === 0 ? (
        <p className="text-ink-muted">You don&apos;t manage a school yet, so there is nothing to buy seats for.</p>
      ) : (
        <SchoolBuyForm options={options} nonce={nonce} action={buySeatsAction} preselectClassId={preselect} />
      )}
      <section aria-labelledby="prices" className="space-y-3">
        <h2 id="prices" className="text-title-2">
          Prices per seat
        </h2>
        <p className="text-ink-muted">
          In euros ({CURRENCY.toUpperCase()}). The whole order is priced at the tier its number of seats falls in. Unused seats (nobody has taken them and no invitation holds
          them) can be refunded from <Link href="/school/orders">Orders</Link>.
        </p>
        <Table caption="Price of one seat by course and by number of seats in the order">
          <TableHead>
            <TableRow>
              <TableHeaderCell>Course</TableHeaderCell>
              {SCHOOL_TIERS.map((t) => (
                <TableHeaderCell key={t.label} numeric>
                  {t.label}
                  {t.percentOff ? ` (−${t.percentOff} %)` : ""}
                </TableHeaderCell>
              ))}
            </TableRow>
          </TableHead>
          <TableBody>
            {options.courses.map((c) => (
              <TableRow key={c.slug}>
                <TableHeaderCell scope="row">{c.title}</TableHeaderCell>
                {SCHOOL_TIERS.map((t) => {
                  const q = quoteSchoolOrder({ courseSlug: c.slug, quantity: t.minSeats });
                  return (
                    <TableCell key={t.label} numeric>
                      {q.ok ? formatMoney(q.unitAmount) : "–"}
                    </TableCell>
                  );
                })}
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </section>
    </div>
  );
}
