import type { ReactNode } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { Button } from "@/components/ui/button";
import { Checkbox } from "@/components/ui/checkbox";
import { FormField } from "@/components/ui/form-field";
import { Input } from "@/components/ui/input";
import { ProgressBar, progressPercent } from "@/components/ui/progress-bar";
import { RadioGroup } from "@/components/ui/radio-group";
import { Table, TableBody, TableCell, TableHead, TableHeaderCell, TableRow } from "@/components/ui/table";

/* Server-rendered markup checked against the accessibility semantics the primitives promise.
   Each check names the WCAG 2.2 success criterion or WAI-ARIA 1.2 / HTML rule it follows. */

function markup(node: ReactNode): string {
  return renderToStaticMarkup(node);
}

/** Attributes of the first element matching tag and a required attribute fragment. */
function attributesOf(html: string, tag: string, containing = ""): Record<string, string> {
  const pattern = new RegExp(`<${tag}\\b([^>]*)>`, "g");
  for (const match of html.matchAll(pattern)) {
    if (!match[1].includes(containing)) continue;
    return Object.fromEntries([...match[1].matchAll(/([a-zA-Z-:]+)="([^"]*)"/g)].map((pair) => [pair[1], pair[2]]));
  }
  throw new Error(`no <${tag}> containing ${containing} in ${html}`);
}

describe("FormField", () => {
  it("labels the control and describes it by hint and error (WCAG 1.3.1, 3.3.1, 3.3.2)", () => {
    const html = markup(
      <FormField label="E-mail" name="email" hint="We send the invitation here." error="Enter an e-mail address.">
        {(control) => <Input type="email" {...control} />}
      </FormField>,
    );
    const input = attributesOf(html, "input");
    const label = attributesOf(html, "label");
    expect(label.for).toBe(input.id);
    expect(input.name).toBe("email");
    expect(input["aria-invalid"]).toBe("true");
    const describedIds = input["aria-describedby"].split(" ");
    expect(describedIds).toEqual([`${input.id}-hint`, `${input.id}-error`]);
    for (const id of describedIds) expect(html).toContain(`id="${id}"`);
    // The error is said in words, not only shown in red (WCAG 1.4.1).
    expect(html).toContain("Error: </span>Enter an e-mail address.");
  });

  it("leaves a valid control without aria-invalid and without an error reference", () => {
    const html = markup(<FormField label="Name" name="name">{(control) => <Input {...control} />}</FormField>);
    const input = attributesOf(html, "input");
    expect(input["aria-invalid"]).toBeUndefined();
    expect(input["aria-describedby"]).toBeUndefined();
  });

  it("lists every message zod returned for the field", () => {
    const html = markup(
      <FormField label="Seats" name="seats" error={["Enter a whole number.", "At most 40 seats."]}>
        {(control) => <Input {...control} />}
      </FormField>,
    );
    expect(html).toContain("Enter a whole number.");
    expect(html).toContain("At most 40 seats.");
  });
});

describe("ProgressBar", () => {
  // WAI-ARIA 1.2, role progressbar: aria-valuenow within aria-valuemin..aria-valuemax; aria-valuetext for words.
  it("exposes role, value, range and a text value", () => {
    const html = markup(<ProgressBar label="Miking the band" valueNow={7} valueMax={12} valueText="7 of 12 lessons" />);
    const bar = attributesOf(html, "div", 'role="progressbar"');
    expect(bar["aria-valuenow"]).toBe("7");
    expect(bar["aria-valuemin"]).toBe("0");
    expect(bar["aria-valuemax"]).toBe("12");
    expect(bar["aria-valuetext"]).toBe("7 of 12 lessons");
    expect(html).toContain(`id="${bar["aria-labelledby"]}"`);
    // The same value is visible as text (WCAG 1.4.1: the bar is not the only way to read it).
    expect(html).toContain(">7 of 12 lessons</span>");
  });

  it("clamps an out-of-range value into the range", () => {
    const bar = attributesOf(markup(<ProgressBar label="x" valueNow={130} />), "div", 'role="progressbar"');
    expect(bar["aria-valuenow"]).toBe("100");
  });

  it("computes whole percentages", () => {
    expect(progressPercent(7, 0, 12)).toBe(58); // 7/12 = 0.5833…
    expect(progressPercent(-5, 0, 10)).toBe(0);
    expect(progressPercent(3, 0, 0)).toBe(0); // empty range: nothing to show
  });
});

describe("Table", () => {
  it("has a caption that also names its scroll region, and scoped header cells (WCAG 1.3.1)", () => {
    const html = markup(
      <Table caption="Input list">
        <TableHead>
          <TableRow>
            <TableHeaderCell>Source</TableHeaderCell>
            <TableHeaderCell numeric>Ch</TableHeaderCell>
          </TableRow>
        </TableHead>
        <TableBody>
          <TableRow>
            <TableHeaderCell scope="row">Kick drum</TableHeaderCell>
            <TableCell numeric>1</TableCell>
          </TableRow>
        </TableBody>
      </Table>,
    );
    const region = attributesOf(html, "div", 'role="region"');
    const caption = attributesOf(html, "caption");
    expect(region["aria-labelledby"]).toBe(caption.id);
    expect(region.tabindex).toBe("0"); // keyboard users can scroll a wide table (WCAG 2.1.1)
    expect(html.match(/scope="col"/g)).toHaveLength(2);
    expect(html.match(/scope="row"/g)).toHaveLength(1);
    // Cells carry no class of their own (.data-table in app/globals.css styles them once), only the numeric marker.
    expect(html.match(/<(th|td|tr)\b[^>]*class=/g)).toBeNull();
    expect(html.match(/data-numeric=""/g)).toHaveLength(2);
  });
});

describe("RadioGroup", () => {
  it("groups native radios under one name in a fieldset with a legend (WCAG 1.3.1)", () => {
    const html = markup(
      <RadioGroup
        legend="Pattern"
        name="pattern"
        defaultValue="cardioid"
        error="Choose one."
        options={[
          { value: "cardioid", label: "Cardioid" },
          { value: "figure-8", label: "Figure-8" },
        ]}
      />,
    );
    const fieldset = attributesOf(html, "fieldset");
    const legend = attributesOf(html, "legend");
    expect(fieldset["aria-labelledby"]).toBe(legend.id);
    expect(fieldset["aria-invalid"]).toBe("true");
    expect(html).toContain(`id="${fieldset["aria-describedby"]}"`);
    const radios = [...html.matchAll(/<input[^>]*type="radio"[^>]*>/g)].map((match) => match[0]);
    expect(radios).toHaveLength(2);
    for (const radio of radios) expect(radio).toContain('name="pattern"');
    expect(radios[0]).toMatch(/\schecked=""/);
    expect(radios[1]).not.toMatch(/\schecked=/);
  });
});

describe("Checkbox", () => {
  it("ties its label to the box and describes it by its hint", () => {
    const html = markup(<Checkbox name="phantomOff" label="Phantom power off" hint="Before patching." />);
    const input = attributesOf(html, "input");
    expect(attributesOf(html, "label").for).toBe(input.id);
    expect(input["aria-describedby"]).toBe(`${input.id}-hint`);
    // 24 × 24 CSS px box: WCAG 2.2 SC 2.5.8 Target Size (Minimum).
    expect(input.class).toContain("size-6");
  });
});

describe("Button", () => {
  it("does not submit a form unless asked (HTML: a button's default type is submit)", () => {
    expect(attributesOf(markup(<Button>Save</Button>), "button").type).toBe("button");
    expect(attributesOf(markup(<Button type="submit">Save</Button>), "button").type).toBe("submit");
  });

  it("keeps its name and focusability while loading, and says it is working (WCAG 4.1.2)", () => {
    const html = markup(<Button loading>Send photo</Button>);
    const button = attributesOf(html, "button");
    expect(button["aria-disabled"]).toBe("true");
    expect(button.disabled).toBeUndefined();
    expect(html).toContain("Send photo");
    expect(html).toContain("working…");
  });
});
