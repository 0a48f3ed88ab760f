// The messages about money: the receipt of a paid order and the answer to a refund request.
// Amounts arrive as preformatted strings (lib/pricing/prices.ts formatMoney), so a template
// never does arithmetic. Rendered through the shared layout of templates.ts.
import { layout, type RenderedMail } from "./templates";

export type PaymentMailTemplate =
  | {
      template: "purchase_receipt";
      name: string;
      orderRef: string;
      courseTitle: string;
      /** "6 seats for the class Autumn intake (2026 autumn)" or "Your own seat". */
      what: string;
      unitPrice: string;
      quantity: number;
      total: string;
      paidOn: string;
      url: string;
    }
  | {
      template: "refund_decision";
      name: string;
      orderRef: string;
      courseTitle: string;
      approved: boolean;
      seats: number;
      amount: string;
      note: string | null;
      url: string;
    };

export function renderPaymentMail(m: PaymentMailTemplate): RenderedMail {
  switch (m.template) {
    case "purchase_receipt": {
      const lines = [
        `Order ${m.orderRef}, paid on ${m.paidOn}`,
        `${m.courseTitle}: ${m.what}`,
        `${m.quantity} × ${m.unitPrice} = ${m.total}`,
      ];
      return {
        subject: `Receipt for your Axisline order ${m.orderRef}`,
        text: `Hello ${m.name},\n\nThank you: your payment was received.\n\n${lines.join("\n")}\n\nSee the order at any time:\n\n${m.url}\n`,
        html: layout("Payment received", [`Hello ${m.name},`, "Thank you: your payment was received.", ...lines], { label: "See the order", url: m.url }),
      };
    }
    case "refund_decision": {
      const outcome = m.approved
        ? `Your request to refund ${m.seats} unused ${m.seats === 1 ? "seat" : "seats"} (${m.amount}) of order ${m.orderRef}, ${m.courseTitle}, was approved. The money goes back to the card or account that paid; banks usually take 5 to 10 days to show it.`
        : `Your request to refund ${m.seats} unused ${m.seats === 1 ? "seat" : "seats"} (${m.amount}) of order ${m.orderRef}, ${m.courseTitle}, was not approved. The seats stay in your class.`;
      const note = m.note ? [`Note from Axisline: ${m.note}`] : [];
      return {
        subject: `Refund ${m.approved ? "approved" : "not approved"} for order ${m.orderRef}`,
        text: `Hello ${m.name},\n\n${outcome}\n${note.map((n) => `\n${n}\n`).join("")}\nSee the order:\n\n${m.url}\n`,
        html: layout(m.approved ? "Refund approved" : "Refund not approved", [`Hello ${m.name},`, outcome, ...note], { label: "See the order", url: m.url }),
      };
    }
  }
}
