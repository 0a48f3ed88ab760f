"use client";
// The Bench's client side: reads a tool's state from the URL query (useSearchParams, so the page
// wraps it in <Suspense>), and writes every change back with router.replace, without scrolling.
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useCallback, useEffect, useRef, useState } from "react";
import { Notice } from "@/components/ui/notice";
import { benchQueryString, parseBenchQuery, type BenchStates } from "./bench-state";
import type { FigureName } from "./figure-names";
import { FIGURE_COMPONENTS } from "./lazy-figures";

/** Slider moves come in bursts; write the URL once they settle. */
const URL_WRITE_DELAY_MS = 250;

export function BenchToolFromUrl({ tool }: { tool: FigureName }) {
  const searchParams = useSearchParams();
  const router = useRouter();
  const pathname = usePathname();
  // Read once: later URL changes are our own writes and must not reset the figure.
  const [parsed] = useState(() => parseBenchQuery(tool, new URLSearchParams(searchParams.toString())));
  const pendingWrite = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);

  useEffect(() => () => clearTimeout(pendingWrite.current), []);

  const onStateChange = useCallback(
    (state: BenchStates[FigureName]) => {
      clearTimeout(pendingWrite.current);
      pendingWrite.current = setTimeout(() => {
        const query = benchQueryString(tool, state as never);
        router.replace(`${pathname}?${query}`, { scroll: false });
      }, URL_WRITE_DELAY_MS);
    },
    [pathname, router, tool],
  );

  const Figure = FIGURE_COMPONENTS[tool];
  return (
    <div className="flex flex-col gap-3">
      {parsed.rejectedKeys.length > 0 && (
        <Notice tone="note" title="part of the link was not understood" data-testid="bench-rejected">
          These settings were out of range or unknown and were reset to their defaults: {parsed.rejectedKeys.join(", ")}.
        </Notice>
      )}
      <Figure initialState={parsed.state} onStateChange={onStateChange} />
    </div>
  );
}

/** What the statically generated page shows before the query is read: the figure at its defaults. */
export function BenchToolDefault({ tool }: { tool: FigureName }) {
  const Figure = FIGURE_COMPONENTS[tool];
  return <Figure />;
}
