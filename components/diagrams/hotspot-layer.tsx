"use client";
// Keyboard-operable hotspot overlay for "pick the position" quiz questions. The diagram is drawn
// with letters instead of names (names would give the answer away); each selectable position gets
// a round target of at least 24 px over its registry hotspot, inside a radiogroup.
// Tab enters the group, arrow keys move between targets, Enter or Space selects.
import { useRef, useState, type KeyboardEvent } from "react";
import { positionLetter } from "./diagram-frame";
import { Diagram } from "./diagram";
import { DIAGRAMS, type DiagramName } from "./registry";

/** Smallest target side, CSS px (WCAG 2.2 target size, minimum). */
const MIN_TARGET_PX = 24;

export interface DiagramHotspotProps {
  readonly name: DiagramName;
  /** The group's accessible name, usually the question text. */
  readonly label: string;
  /** Positions the learner may pick (default: all of the diagram's positions). */
  readonly selectableIds?: readonly string[];
  /** Controlled selection; leave undefined to let the component keep its own. */
  readonly selectedId?: string | null;
  readonly onSelect: (positionId: string) => void;
  readonly disabled?: boolean;
}

export function DiagramHotspot({ name, label, selectableIds, selectedId, onSelect, disabled = false }: DiagramHotspotProps) {
  const spec = DIAGRAMS[name];
  const allowed = selectableIds ? new Set(selectableIds) : undefined;
  const targets = spec.positions.filter((position) => allowed === undefined || allowed.has(position.id));
  const shownIds = targets.map((position) => position.id);

  const [ownSelection, setOwnSelection] = useState<string | null>(null);
  const selected = selectedId !== undefined ? selectedId : ownSelection;
  const selectedIndex = targets.findIndex((position) => position.id === selected);
  const [focusIndex, setFocusIndex] = useState(0);
  const buttons = useRef<(HTMLButtonElement | null)[]>([]);
  // Roving tabindex: the selected target, else the last one focused, is the group's tab stop.
  const tabStop = selectedIndex >= 0 ? selectedIndex : Math.min(focusIndex, targets.length - 1);

  function choose(positionId: string) {
    if (disabled) return;
    setOwnSelection(positionId);
    onSelect(positionId);
  }

  function moveFocus(event: KeyboardEvent<HTMLButtonElement>, index: number) {
    const steps: Record<string, number> = { ArrowRight: 1, ArrowDown: 1, ArrowLeft: -1, ArrowUp: -1 };
    let next: number | undefined;
    if (event.key in steps) next = (index + steps[event.key] + targets.length) % targets.length;
    if (event.key === "Home") next = 0;
    if (event.key === "End") next = targets.length - 1;
    if (next === undefined) return;
    event.preventDefault();
    setFocusIndex(next);
    buttons.current[next]?.focus();
  }

  const { width, height } = spec.viewBox;
  return (
    <div style={{ position: "relative" }}>
      <Diagram name={name} labelMode="letters" onlyPositions={shownIds} highlight={selected ? [selected] : undefined} />
      <div role="radiogroup" aria-label={label} aria-disabled={disabled || undefined} style={{ position: "absolute", inset: 0 }}>
        {targets.map((position, index) => {
          const checked = position.id === selected;
          const sizePercent = ((2 * position.r) / width) * 100;
          return (
            <button
              key={position.id}
              ref={(element) => {
                buttons.current[index] = element;
              }}
              type="button"
              role="radio"
              aria-checked={checked}
              aria-label={`Position ${positionLetter(index)}`}
              data-position-id={position.id}
              tabIndex={index === tabStop ? 0 : -1}
              onClick={() => choose(position.id)}
              onFocus={() => setFocusIndex(index)}
              onKeyDown={(event) => moveFocus(event, index)}
              className="rounded-full focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-current"
              style={{
                position: "absolute",
                left: `${(position.x / width) * 100}%`,
                top: `${(position.y / height) * 100}%`,
                width: `max(${MIN_TARGET_PX}px, ${sizePercent.toFixed(2)}%)`,
                aspectRatio: "1",
                transform: "translate(-50%, -50%)",
                background: "transparent",
                border: "none",
                padding: 0,
                cursor: disabled ? "default" : "pointer",
              }}
            />
          );
        })}
      </div>
    </div>
  );
}
