// The stand-in's decoding of bracket-key form bodies (lib/payments/fake/form.ts). Expected values
// follow the encoding the service's API reference shows in its curl examples
// (`-d "line_items[0][price]"=…`, `-d "expand[]"=…`, `-d "metadata[order_id]"=…`).
import { describe, expect, it } from "vitest";
import { FormError, parseForm } from "@/lib/payments/fake/form";

describe("parseForm", () => {
  it("expands nested bracket keys and indexed groups into objects and arrays", () => {
    const body = "mode=payment&line_items[0][price_data][currency]=eur&line_items[0][price_data][unit_amount]=4900&line_items[0][quantity]=6&line_items[1][price]=price_1&line_items[1][quantity]=1&metadata[order]=ord%201";
    expect(parseForm(body)).toEqual({
      mode: "payment",
      line_items: [{ price_data: { currency: "eur", unit_amount: "4900" }, quantity: "6" }, { price: "price_1", quantity: "1" }],
      metadata: { order: "ord 1" },
    });
  });
  it("reads `expand[]` and `expand[0]` alike, in order", () => {
    expect(parseForm("expand[]=line_items&expand[]=payment_intent")).toEqual({ expand: ["line_items", "payment_intent"] });
    expect(parseForm(encodeURI("expand[1]=b&expand[0]=a"))).toEqual({ expand: ["a", "b"] });
  });
  it("keeps a group with gaps in its indices as an object (not an array with holes)", () => {
    expect(parseForm("a[0]=x&a[2]=y")).toEqual({ a: { 0: "x", 2: "y" } });
  });
  it.each(["__proto__[x]=1", "a[constructor]=1", "a]=1", "a[b]c=1"])("refuses the key of %s", (body) => {
    expect(() => parseForm(body)).toThrow(FormError);
  });
  it("refuses a key that is both a value and a group", () => {
    expect(() => parseForm("a=1&a[b]=2")).toThrow(FormError);
    expect(() => parseForm("a[b]=2&a=1")).toThrow(FormError);
  });
});
