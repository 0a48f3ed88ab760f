"use client";
// A thin bar at the top of the window showing how far through the lesson text the reader is.
// Decorative (the scroll position already tells assistive technology), and hidden in print.
import { useEffect, useState } from "react";

export function ReadingProgress({ targetId }: { targetId: string }) {
  const [fraction, setFraction] = useState(0);
  useEffect(() => {
    let frame = 0;
    const measure = () => {
      frame = 0;
      const target = document.getElementById(targetId);
      if (!target) return;
      const rect = target.getBoundingClientRect();
      const travel = rect.height - window.innerHeight;
      setFraction(travel <= 0 ? (rect.top <= 0 ? 1 : 0) : Math.min(1, Math.max(0, -rect.top / travel)));
    };
    const schedule = () => {
      if (!frame) frame = requestAnimationFrame(measure);
    };
    measure();
    window.addEventListener("scroll", schedule, { passive: true });
    window.addEventListener("resize", schedule);
    // The locked body arrives after the first paint and changes the height.
    const observer = new ResizeObserver(schedule);
    const target = document.getElementById(targetId);
    if (target) observer.observe(target);
    return () => {
      window.removeEventListener("scroll", schedule);
      window.removeEventListener("resize", schedule);
      observer.disconnect();
      if (frame) cancelAnimationFrame(frame);
    };
  }, [targetId]);
  return (
    <div aria-hidden="true" data-print="hidden" className="fixed inset-x-0 top-0 z-40 h-1 bg-transparent print:hidden">
      <div className="h-full origin-left bg-accent-line" style={{ transform: `scaleX(${fraction})` }} />
    </div>
  );
}
