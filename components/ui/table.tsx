import { useId, type ComponentProps, type ReactNode } from "react";
import { cx } from "./cx";

export type TableProps = Omit<ComponentProps<"table">, "children"> & {
  /** Every table says what it holds (WCAG 1.3.1); the scroll region is named after it too. */
  caption: ReactNode;
  /** Keep the caption for screen readers only, when a visible heading already says the same. */
  captionHidden?: boolean;
  children: ReactNode;
};

/**
 * A data table in a horizontally scrollable, focusable region, so a wide table never makes
 * the page scroll sideways at 320 px (WCAG 1.4.10) and keyboard users can scroll it (2.1.1).
 * Rows and cells are styled once, by `.data-table` in app/globals.css, not by a class on each:
 * a dashboard's table has hundreds of cells, and every class string travels twice (in the HTML
 * and again in the page's RSC payload): 41 KB of a 50-apprentice class page's 99 KB. The rule
 * sits in the components layer, so a utility passed as `className` to one cell still wins.
 */
export function Table({ caption, captionHidden = false, className, children, ...props }: TableProps) {
  const captionId = `table-caption-${useId()}`;
  return (
    <div
      role="region"
      aria-labelledby={captionId}
      tabIndex={0}
      className="max-w-full overflow-x-auto rounded-card border border-rule bg-surface-raised"
    >
      <table className={cx("data-table w-full border-collapse text-left text-body-sm", className)} {...props}>
        <caption
          id={captionId}
          className={cx(captionHidden ? "sr-only" : "px-4 pt-3 pb-2 text-left text-body font-semibold text-ink")}
        >
          {caption}
        </caption>
        {children}
      </table>
    </div>
  );
}

export function TableHead({ className, ...props }: ComponentProps<"thead">) {
  return <thead className={cx("border-b border-border bg-surface-sunken", className)} {...props} />;
}

export function TableBody({ className, ...props }: ComponentProps<"tbody">) {
  return <tbody className={cx("divide-y divide-rule", className)} {...props} />;
}

export function TableRow(props: ComponentProps<"tr">) {
  return <tr {...props} />;
}

type CellAlignment = { numeric?: boolean };

/** `data-numeric` right-aligns a cell in the figures face (.data-table in app/globals.css). */
const numericAttribute = (numeric: boolean | undefined) => (numeric ? { "data-numeric": "" } : {});

export type TableHeaderCellProps = ComponentProps<"th"> & CellAlignment;

/** A header cell; `scope` defaults to "col". Use scope="row" for the first cell of a body row. */
export function TableHeaderCell({ scope = "col", numeric, ...props }: TableHeaderCellProps) {
  return <th scope={scope} {...numericAttribute(numeric)} {...props} />;
}

export type TableCellProps = ComponentProps<"td"> & CellAlignment;

/** A data cell; `numeric` right-aligns in the figures face so columns of numbers line up. */
export function TableCell({ numeric, ...props }: TableCellProps) {
  return <td {...numericAttribute(numeric)} {...props} />;
}
