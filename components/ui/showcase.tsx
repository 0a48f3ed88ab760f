import { palette, paletteTokenNames } from "@/lib/design/palette";
import {
  ButtonsShowcase,
  CardsShowcase,
  InteractiveShowcase,
  ShowcaseSection,
  StatusShowcase,
  TableShowcase,
} from "./showcase-sections";
import { FormsShowcase } from "./showcase-forms";
import { Toaster } from "./toast";

/**
 * Every primitive in its example states, once on the page's theme and once in a forced dark
 * "stage" band, for the dev page and screenshots. A server component; the interactive parts
 * are client leaves.
 */
export function Showcase() {
  return (
    <Toaster>
      <div className="flex flex-col gap-section">
        <ShowcaseBody heading="Axisline primitives" copy="page" />
        <div data-theme="dark" className="rounded-card bg-surface p-gutter text-ink md:p-8">
          <ShowcaseBody heading="On stage (dark)" copy="stage" />
        </div>
      </div>
    </Toaster>
  );
}

function ShowcaseBody({ heading, copy }: { heading: string; copy: string }) {
  return (
    <div className="mx-auto flex w-full max-w-page flex-col gap-section">
      <h2 className="text-title-1 text-ink">{heading}</h2>
      <PaletteSwatches />
      <ButtonsShowcase copy={copy} />
      <FormsShowcase copy={copy} />
      <StatusShowcase />
      <CardsShowcase copy={copy} />
      <TableShowcase copy={copy} />
      <InteractiveShowcase />
    </div>
  );
}

/** The tokens as painted by the current theme, with the hex of both themes beside each. */
function PaletteSwatches() {
  return (
    <ShowcaseSection title="Palette">
      <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-6">
        {paletteTokenNames.map((token) => (
          <li key={token} className="flex flex-col gap-1 text-caption">
            <span
              aria-hidden="true"
              className="h-10 rounded-control border border-rule"
              style={{ backgroundColor: `var(--color-${token})` }}
            />
            <span className="font-semibold text-ink">{token}</span>
            <span className="font-mono text-ink-muted">
              {palette.light[token]} / {palette.dark[token]}
            </span>
          </li>
        ))}
      </ul>
    </ShowcaseSection>
  );
}
