import type { ComponentProps, ReactNode } from "react";
import { cx } from "./cx";
import { AlertIcon, CautionIcon, CheckIcon, InfoIcon } from "./icons";

export type NoticeTone = "note" | "caution" | "danger" | "success";

type ToneStyle = { word: string; Icon: typeof InfoIcon; box: string; ink: string };

const tones: Record<NoticeTone, ToneStyle> = {
  note: { word: "Note", Icon: InfoIcon, box: "border-note bg-note-soft", ink: "text-note" },
  caution: { word: "Caution", Icon: CautionIcon, box: "border-caution bg-caution-soft", ink: "text-caution" },
  danger: { word: "Danger", Icon: AlertIcon, box: "border-danger bg-danger-soft", ink: "text-danger" },
  success: { word: "Done", Icon: CheckIcon, box: "border-success bg-success-soft", ink: "text-success" },
};

export type NoticeProps = Omit<ComponentProps<"div">, "title"> & {
  tone?: NoticeTone;
  title?: ReactNode;
  /** Announce on appearance (e.g. a form-level error after a server action): role=alert for danger, else status. */
  announce?: boolean;
  /** Replaces the tone's word, e.g. "Not signed in" for a form error that is no hazard. */
  label?: string;
};

/**
 * A callout: lesson notes, safety cautions, form-level errors. The tone is said in words
 * ("Caution", "Danger"...) and by glyph, not by colour alone (WCAG 1.4.1).
 */
export function Notice({ tone = "note", title, announce = false, label, className, children, ...props }: NoticeProps) {
  const { Icon, box, ink } = tones[tone];
  const word = label ?? tones[tone].word;
  const role = announce ? (tone === "danger" ? "alert" : "status") : "note";
  return (
    <div role={role} className={cx("flex gap-3 rounded-card border-l-4 px-4 py-3", box, className)} {...props}>
      <Icon className={cx("mt-1", ink)} />
      <div className="flex min-w-0 flex-col gap-1 text-body text-ink">
        <p className={cx("font-semibold", ink)}>
          {word}
          {title && <span>: {title}</span>}
        </p>
        {children && <div className="flex flex-col gap-2">{children}</div>}
      </div>
    </div>
  );
}
