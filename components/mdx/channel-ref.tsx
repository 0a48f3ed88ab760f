// <Ch n="9" claims="di:active phantom:on">the active DI on Joss's bass</Ch>: marks a passage that
// speaks of a line of the Lantern Room input list. It renders its words unchanged; the content
// tests read the tag and check each claim against the scenario data, so a lesson cannot say
// something about a channel that the input list contradicts.
import type { ReactNode } from "react";

export function Ch({ children }: { n?: string; claims?: string; children?: ReactNode }) {
  return <>{children}</>;
}
