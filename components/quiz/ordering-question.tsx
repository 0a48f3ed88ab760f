"use client";
// Put items in order with Move up / Move down buttons: a single-pointer, keyboard-friendly
// alternative to dragging (WCAG 2.2 SC 2.5.7). Focus stays on the moved item's button.
import { useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { QuestionFrame, type QuestionProps } from "./question-frame";

export function OrderingQuestion({ question, answer, onAnswer, disabled, number, total }: QuestionProps<"ordering">) {
  const known = new Set(question.items.map((i) => i.id));
  const saved = answer?.order.filter((id) => known.has(id));
  const order = saved && saved.length === question.items.length ? saved : question.items.map((i) => i.id);
  const textOf = (id: string) => question.items.find((i) => i.id === id)?.text ?? id;
  const [announcement, setAnnouncement] = useState("");
  const buttons = useRef(new Map<string, HTMLButtonElement | null>());

  function move(index: number, step: -1 | 1) {
    const target = index + step;
    if (target < 0 || target >= order.length) return;
    const next = order.slice();
    [next[index], next[target]] = [next[target], next[index]];
    onAnswer({ kind: "ordering", order: next }, { debounceMs: 600 });
    setAnnouncement(`${textOf(order[index])} moved to position ${target + 1} of ${order.length}.`);
    // Keep focus on the same item; at an end of the list the button in the other direction.
    const edge = target === 0 || target === order.length - 1;
    const key = `${order[index]}:${edge ? (step === -1 ? "down" : "up") : step === -1 ? "up" : "down"}`;
    requestAnimationFrame(() => buttons.current.get(key)?.focus());
  }

  return (
    <QuestionFrame
      question={question}
      number={number}
      total={total}
      instructions="Put the steps in order, first at the top. Use the Move up and Move down buttons beside each step. Only the exact order earns the point."
    >
      <ol className="flex flex-col gap-2">
        {order.map((id, index) => (
          <li key={id} className="flex flex-wrap items-center gap-3 rounded-control border border-border bg-surface px-3 py-2">
            <span aria-hidden="true" className="w-6 font-mono text-ink-muted tabular-nums">
              {index + 1}.
            </span>
            <span className="min-w-0 flex-[1_1_12rem] text-body">{textOf(id)}</span>
            <span className="ml-auto flex gap-2">
              <Button
                size="sm"
                variant="secondary"
                disabled={disabled || index === 0}
                ref={(el) => {
                  buttons.current.set(`${id}:up`, el);
                }}
                aria-label={`Move up: ${textOf(id)}`}
                onClick={() => move(index, -1)}
              >
                <span aria-hidden="true">↑</span> Up
              </Button>
              <Button
                size="sm"
                variant="secondary"
                disabled={disabled || index === order.length - 1}
                ref={(el) => {
                  buttons.current.set(`${id}:down`, el);
                }}
                aria-label={`Move down: ${textOf(id)}`}
                onClick={() => move(index, 1)}
              >
                <span aria-hidden="true">↓</span> Down
              </Button>
            </span>
          </li>
        ))}
      </ol>
      <p role="status" className="sr-only">
        {announcement}
      </p>
    </QuestionFrame>
  );
}
