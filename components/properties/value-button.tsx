'use client';

import { useId, useLayoutEffect, useRef, useState, type CSSProperties } from 'react';
import type { TableValue } from '@/lib/properties/table-rows';
import { SourceSummary } from './source-summary';
import { ValueText } from '@/components/units/value-text';

const GAP = 2;
const WIDTH = 288;

/**
 * A value as a focusable button; hovering or focusing it shows its source and conditions in a
 * tooltip the button names with aria-describedby. The tooltip is fixed to the viewport so the
 * table's scrolling box does not clip it, and follows the button when either scrolls; Escape,
 * blur or leaving it closes it.
 */
export function ValueButton({ label, value }: { label: string; value: TableValue }) {
  const id = useId();
  const ref = useRef<HTMLButtonElement>(null);
  const [open, setOpen] = useState(false);
  const [style, setStyle] = useState<CSSProperties>({});
  const show = () => setOpen(true);
  const close = () => setOpen(false);

  // Placed before paint (no unplaced flash); while open it follows its button as things scroll.
  useLayoutEffect(() => {
    if (!open) return;
    const place = () => {
      const r = ref.current?.getBoundingClientRect();
      if (!r) return;
      const left = Math.max(8, Math.min(r.left, window.innerWidth - WIDTH - 8));
      setStyle(
        r.top < window.innerHeight / 2
          ? { position: 'fixed', left, top: r.bottom + GAP }
          : { position: 'fixed', left, bottom: window.innerHeight - r.top + GAP },
      );
    };
    place();
    window.addEventListener('scroll', place, { capture: true, passive: true });
    window.addEventListener('resize', place);
    return () => {
      window.removeEventListener('scroll', place, { capture: true });
      window.removeEventListener('resize', place);
    };
  }, [open]);

  return (
    <span className="inline-block" onMouseEnter={show} onMouseLeave={close}>
      <button
        ref={ref}
        type="button"
        aria-describedby={id}
        onFocus={show}
        onBlur={close}
        onKeyDown={(e) => {
          if (e.key === 'Escape') close();
        }}
        className="num rounded px-1 text-left text-sm whitespace-nowrap text-stone-900 underline decoration-stone-300 decoration-dotted underline-offset-4 hover:bg-leaf-50 focus:outline-none focus-visible:ring-2 focus-visible:ring-leaf-600"
      >
        <ValueText value={value} />
      </button>
      <span
        role="tooltip"
        id={id}
        hidden={!open}
        style={style}
        className="z-50 block w-72 max-w-[calc(100vw-1rem)] rounded-md border border-stone-300 bg-white p-3 text-left text-xs leading-relaxed font-normal whitespace-normal text-stone-700 shadow-lg"
      >
        <SourceSummary label={label} value={value} />
      </span>
    </span>
  );
}
