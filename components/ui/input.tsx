import type { ComponentProps } from "react";
import { controlClassName } from "./control-styles";

/** A single-line text input. Pair it with FormField for its label, hint and error. */
export function Input({ className, type = "text", ...props }: ComponentProps<"input">) {
  return <input type={type} className={controlClassName(className)} {...props} />;
}
