"use client";
// The Bench's client side. The page is built ahead of time with the tool at its defaults and
// hydrates as built; a shared link's query (?pattern=…) is read once hydration is done and the
// figure restarts from it. Every change is written back with router.replace, without scrolling.
// Not useSearchParams: in a page built ahead of time it makes React throw away the figure's
// server HTML and draw it again on the client, so the space below jumped twice while the page
// loaded (Lighthouse mobile: CLS 0.121 on a Bench tool) and the whole figure rendered twice.
import { usePathname, useRouter } from "next/navigation";
import { Fragment, useCallback, useEffect, useMemo, useRef, useState, useSyncExternalStore, type ReactNode } from "react";
import { Notice } from "@/components/ui/notice";
import { benchQueryString, parseBenchQuery, type BenchStates } from "./bench-state";
import type { FigureName } from "./figure-names";
import { FigureBindingContext, type FigureBinding } from "./parts/use-figure-state";

/** Slider moves come in bursts; write the URL once they settle. */
const URL_WRITE_DELAY_MS = 250;

const subscribeToNothing = () => () => {};

/**
 * The query the page arrived with: "" while the server renders and while React hydrates (so the
 * client's first render matches the built HTML), then the address bar's query as it was when this
 * tool mounted. Later changes are our own writes and must not restart the figure.
 */
function useArrivalQuery(): string {
  const hydrated = useSyncExternalStore(subscribeToNothing, () => true, () => false);
  const [arrival] = useState(() => (typeof window === "undefined" ? "" : window.location.search));
  return hydrated ? arrival : "";
}

/** Wraps the figure the Bench page renders (`children`, from bench-figures.ts) and binds it to the URL. */
export function BenchTool({ tool, children }: { tool: FigureName; children: ReactNode }) {
  const router = useRouter();
  const pathname = usePathname();
  const query = useArrivalQuery();
  const parsed = useMemo(() => parseBenchQuery(tool, new URLSearchParams(query)), [tool, query]);
  const pendingWrite = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);

  useEffect(() => () => clearTimeout(pendingWrite.current), []);

  const onStateChange = useCallback(
    (state: BenchStates[FigureName]) => {
      clearTimeout(pendingWrite.current);
      pendingWrite.current = setTimeout(() => {
        router.replace(`${pathname}?${benchQueryString(tool, state as never)}`, { scroll: false });
      }, URL_WRITE_DELAY_MS);
    },
    [pathname, router, tool],
  );

  const binding = useMemo<FigureBinding>(() => ({ initialState: parsed.state, onStateChange }), [parsed.state, onStateChange]);
  return (
    <div className="flex flex-col gap-3">
      {parsed.rejectedKeys.length > 0 && (
        <Notice tone="note" title="part of the link was not understood" data-testid="bench-rejected">
          These settings were out of range or unknown and were reset to their defaults: {parsed.rejectedKeys.join(", ")}.
        </Notice>
      )}
      <FigureBindingContext value={binding}>
        {/* A new key when a link's query arrives: the figure starts again from it. */}
        <Fragment key={query}>{children}</Fragment>
      </FigureBindingContext>
    </div>
  );
}
