import type { ComponentProps, HTMLAttributes } from "react";
import { cx } from "./cx";

export type CardProps = HTMLAttributes<HTMLElement> & {
  /** The element: a titled region of a page is usually a section; a list item an li. */
  as?: "div" | "section" | "article" | "li";
};

/** A raised panel. Its edge is decorative (`rule`): a card is not a control. */
export function Card({ as: Element = "div", className, ...props }: CardProps) {
  return (
    <Element
      className={cx("flex flex-col gap-4 rounded-card border border-rule bg-surface-raised p-6 shadow-raised", className)}
      {...props}
    />
  );
}

export function CardHeader({ className, ...props }: ComponentProps<"div">) {
  return <div className={cx("flex flex-col gap-1", className)} {...props} />;
}

export type CardTitleProps = ComponentProps<"h2"> & {
  /** Keep the page's heading outline in order (WCAG 1.3.1): pick the level, not the size. */
  level?: 2 | 3 | 4;
};

export function CardTitle({ level = 2, className, ...props }: CardTitleProps) {
  const Heading = `h${level}` as const;
  return <Heading className={cx("text-title-3 text-ink", className)} {...props} />;
}

export function CardDescription({ className, ...props }: ComponentProps<"p">) {
  return <p className={cx("text-body-sm text-ink-muted", className)} {...props} />;
}

export function CardFooter({ className, ...props }: ComponentProps<"div">) {
  return (
    <div
      className={cx("mt-auto flex flex-wrap items-center gap-3 border-t border-rule pt-4", className)}
      {...props}
    />
  );
}
