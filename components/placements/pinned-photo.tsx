// A submitted photo with its review pins drawn on it (numbered markers) and the pins' comments
// listed below in the same numbers, so the comments never depend on seeing the marker. Used by the
// apprentice's attempt history and the earlier attempts on the review page. No client code.
import type { PhotoDto, PinDto } from "@/lib/dto/placements";

export function pinLabel(index: number): string {
  return String(index + 1);
}

export function PinMarker({ pin, label }: { pin: PinDto; label: string }) {
  return (
    <span
      aria-hidden="true"
      className="absolute flex size-7 -translate-x-1/2 -translate-y-1/2 items-center justify-center rounded-full border-2 border-white bg-accent text-body-sm font-bold text-white shadow-md forced-colors:border-[CanvasText]"
      style={{ left: `${pin.x * 100}%`, top: `${pin.y * 100}%` }}
    >
      {label}
    </span>
  );
}

/** `numberFrom`: pins are numbered across all photos of an attempt, so the list reads 1, 2, 3… */
export function PinnedPhoto({ photo, pins, numberFrom = 0, index }: { photo: PhotoDto; pins: PinDto[]; numberFrom?: number; index: number }) {
  return (
    <figure className="flex flex-col gap-2">
      <div className="relative w-full overflow-hidden rounded-card border border-rule bg-surface-sunken" style={{ aspectRatio: `${photo.width || 4} / ${photo.height || 3}` }}>
        {/* Our own route serves the photo with the viewer's cookie; the image optimiser would fetch it without one. */}
        {/* eslint-disable-next-line @next/next/no-img-element */}
        <img src={photo.displayUrl} alt={`Photo ${index + 1}: ${photo.caption}`} className="absolute inset-0 size-full object-contain" loading="lazy" />
        {pins.map((pin, i) => (
          <PinMarker key={pin.id} pin={pin} label={pinLabel(numberFrom + i)} />
        ))}
      </div>
      <figcaption className="text-body-sm text-ink-muted">
        <span className="font-semibold text-ink">Photo {index + 1}.</span> {photo.caption}
      </figcaption>
      {pins.length > 0 && (
        <ol className="flex flex-col gap-1 text-body-sm" aria-label={`Comments pinned on photo ${index + 1}`}>
          {pins.map((pin, i) => (
            <li key={pin.id} className="flex gap-2">
              <span className="font-mono font-bold text-accent-text">{pinLabel(numberFrom + i)}</span>
              <span>
                {pin.comment} <span className="text-ink-muted">({Math.round(pin.x * 100)}% across, {Math.round(pin.y * 100)}% down)</span>
              </span>
            </li>
          ))}
        </ol>
      )}
    </figure>
  );
}
