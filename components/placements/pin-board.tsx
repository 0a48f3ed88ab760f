"use client";
// One photo of a submission as the instructor pins it: zoomable (the frame scrolls), pins placed
// with the mouse OR the keyboard (WCAG 2.2 SC 2.5.7, dragging movements need a single-pointer or
// keyboard alternative; SC 2.1.1): focus the photo, move the crosshair with the arrow keys (Shift
// for bigger steps) and press Enter to drop a pin there. Every pin is a button naming its comment.
import { useId, useState, type KeyboardEvent, type MouseEvent } from "react";
import { Button } from "@/components/ui/button";
import type { PhotoDto, PinDto } from "@/lib/dto/placements";

const ZOOMS = [1, 1.5, 2, 3] as const;
/** Arrow-key steps of the crosshair, as fractions of the photo. */
const STEP = 0.02;
const BIG_STEP = 0.1;

const clamp = (v: number) => Math.min(1, Math.max(0, Math.round(v * 1000) / 1000));

export function PinBoard({
  photo,
  index,
  pins,
  numberOf,
  onDrop,
  onSelect,
}: {
  photo: PhotoDto;
  index: number;
  pins: PinDto[];
  numberOf: (pin: PinDto) => number;
  onDrop: (x: number, y: number) => void;
  onSelect: (pin: PinDto) => void;
}) {
  const [zoom, setZoom] = useState<(typeof ZOOMS)[number]>(1);
  const [cross, setCross] = useState({ x: 0.5, y: 0.5 });
  const [focused, setFocused] = useState(false);
  const helpId = useId();
  const posId = useId();

  function onKey(e: KeyboardEvent<HTMLDivElement>) {
    const step = e.shiftKey ? BIG_STEP : STEP;
    const moves: Record<string, [number, number]> = { ArrowLeft: [-step, 0], ArrowRight: [step, 0], ArrowUp: [0, -step], ArrowDown: [0, step] };
    if (moves[e.key]) {
      e.preventDefault();
      setCross((c) => ({ x: clamp(c.x + moves[e.key][0]), y: clamp(c.y + moves[e.key][1]) }));
    } else if (e.key === "Enter" || e.key === " ") {
      e.preventDefault();
      onDrop(cross.x, cross.y);
    }
  }

  function onClick(e: MouseEvent<HTMLDivElement>) {
    if ((e.target as HTMLElement).closest("button")) return;
    const rect = e.currentTarget.getBoundingClientRect();
    const x = clamp((e.clientX - rect.left) / rect.width);
    const y = clamp((e.clientY - rect.top) / rect.height);
    setCross({ x, y });
    onDrop(x, y);
  }

  const ratio = `${photo.width || 4} / ${photo.height || 3}`;
  return (
    <figure className="flex flex-col gap-2" data-testid={`pin-board-${index}`}>
      <div className="flex flex-wrap items-center gap-2">
        <span className="text-body-sm font-semibold">Zoom {zoom}×</span>
        <Button type="button" size="sm" variant="secondary" onClick={() => setZoom(ZOOMS[Math.max(0, ZOOMS.indexOf(zoom) - 1)])} disabled={zoom === 1}>
          Zoom out<span className="sr-only"> on photo {index + 1}</span>
        </Button>
        <Button type="button" size="sm" variant="secondary" onClick={() => setZoom(ZOOMS[Math.min(ZOOMS.length - 1, ZOOMS.indexOf(zoom) + 1)])} disabled={zoom === ZOOMS.at(-1)}>
          Zoom in<span className="sr-only"> on photo {index + 1}</span>
        </Button>
      </div>
      <div className="max-h-[70vh] overflow-auto rounded-card border border-rule bg-surface-sunken">
        <div
          role="application"
          tabIndex={0}
          aria-label={`Photo ${index + 1}: ${photo.caption}. Pin area`}
          aria-describedby={`${helpId} ${posId}`}
          onKeyDown={onKey}
          onClick={onClick}
          onFocus={() => setFocused(true)}
          onBlur={() => setFocused(false)}
          className="relative cursor-crosshair outline-none focus-visible:ring-4 focus-visible:ring-focus"
          style={{ width: `${zoom * 100}%`, aspectRatio: ratio }}
        >
          {/* eslint-disable-next-line @next/next/no-img-element -- served by our own route with the viewer's cookie */}
          <img src={photo.displayUrl} alt="" className="pointer-events-none absolute inset-0 size-full select-none object-contain" draggable={false} />
          {pins.map((pin) => (
            <button
              key={pin.id}
              type="button"
              onClick={() => onSelect(pin)}
              aria-label={`Pin ${numberOf(pin)}: ${pin.comment || "no comment yet"}`}
              className="absolute flex size-8 -translate-x-1/2 -translate-y-1/2 items-center justify-center rounded-full border-2 border-white bg-accent text-body-sm font-bold text-white shadow-md focus-visible:outline-4 focus-visible:outline-focus forced-colors:border-[CanvasText]"
              style={{ left: `${pin.x * 100}%`, top: `${pin.y * 100}%` }}
            >
              {numberOf(pin)}
            </button>
          ))}
          <span
            aria-hidden="true"
            className={`pointer-events-none absolute size-10 -translate-x-1/2 -translate-y-1/2 rounded-full border-2 border-dashed ${focused ? "border-focus" : "border-white/70"}`}
            style={{ left: `${cross.x * 100}%`, top: `${cross.y * 100}%` }}
          >
            <span className="absolute left-1/2 top-0 h-full w-px -translate-x-1/2 bg-current" />
            <span className="absolute left-0 top-1/2 h-px w-full -translate-y-1/2 bg-current" />
          </span>
        </div>
      </div>
      <figcaption className="flex flex-col gap-1 text-body-sm text-ink-muted">
        <span>
          <span className="font-semibold text-ink">Photo {index + 1}.</span> {photo.caption}
        </span>
        <span id={helpId}>Click the photo to pin a comment, or focus it, move the crosshair with the arrow keys (Shift for bigger steps) and press Enter.</span>
        <span id={posId} aria-live="polite">
          Crosshair at {Math.round(cross.x * 100)}% across, {Math.round(cross.y * 100)}% down.
        </span>
      </figcaption>
    </figure>
  );
}
