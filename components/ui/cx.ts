/** Joins class names, skipping false/null/undefined/"" (so `cx("a", isOn && "b")` works). */
export function cx(...classNames: ReadonlyArray<string | false | null | undefined | 0>): string {
  return classNames.filter(Boolean).join(" ");
}
