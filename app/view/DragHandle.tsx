import { type KeyboardEvent, type PointerEvent, useRef } from 'react';

interface DragHandleProps {
  /** Centre of the handle in the overlay, CSS pixels. */
  x: number;
  y: number;
  label: string;
  className: string;
  selected?: boolean;
  onSelect?(): void;
  onDragStart(): void;
  /** The pointer is at (x, y) in the overlay, CSS pixels. */
  onDrag(x: number, y: number): void;
  /** Arrow keys: a step of (da, db) as shares of the slice width and height. */
  onNudge(da: number, db: number): void;
  onDelete?(): void;
}

/** A point on the slice the user can drag with the pointer or move with the arrow keys. */
export function DragHandle(props: DragHandleProps) {
  const dragging = useRef(false);
  const overlayOffset = (event: PointerEvent<HTMLButtonElement>): [number, number] => {
    const overlay = event.currentTarget.parentElement;
    const rect = overlay?.getBoundingClientRect();
    return rect ? [event.clientX - rect.left, event.clientY - rect.top] : [props.x, props.y];
  };
  const onPointerDown = (event: PointerEvent<HTMLButtonElement>) => {
    if (event.button !== 0) return;
    event.stopPropagation();
    event.preventDefault();
    event.currentTarget.setPointerCapture(event.pointerId);
    event.currentTarget.focus();
    props.onSelect?.();
    dragging.current = false;
  };
  const onPointerMove = (event: PointerEvent<HTMLButtonElement>) => {
    if (!event.currentTarget.hasPointerCapture(event.pointerId)) return;
    event.stopPropagation();
    if (!dragging.current) {
      dragging.current = true;
      props.onDragStart();
    }
    const [x, y] = overlayOffset(event);
    props.onDrag(x, y);
  };
  const onPointerUp = (event: PointerEvent<HTMLButtonElement>) => {
    event.stopPropagation();
    if (event.currentTarget.hasPointerCapture(event.pointerId))
      event.currentTarget.releasePointerCapture(event.pointerId);
    dragging.current = false;
  };
  const onKeyDown = (event: KeyboardEvent<HTMLButtonElement>) => {
    const step = event.shiftKey ? 0.1 : 0.01;
    const moves: Record<string, [number, number]> = {
      ArrowLeft: [-step, 0],
      ArrowRight: [step, 0],
      ArrowUp: [0, step],
      ArrowDown: [0, -step],
    };
    const move = moves[event.key];
    if (move) {
      event.preventDefault();
      event.stopPropagation();
      props.onNudge(move[0], move[1]);
    } else if ((event.key === 'Delete' || event.key === 'Backspace') && props.onDelete) {
      event.preventDefault();
      event.stopPropagation();
      props.onDelete();
    }
  };
  return (
    <button
      type="button"
      className={`drag-handle ${props.className}${props.selected ? ' is-selected' : ''}`}
      style={{ left: props.x, top: props.y }}
      aria-label={props.label}
      aria-pressed={props.selected}
      onPointerDown={onPointerDown}
      onPointerMove={onPointerMove}
      onPointerUp={onPointerUp}
      onPointerCancel={onPointerUp}
      onKeyDown={onKeyDown}
      onClick={(event) => {
        event.stopPropagation();
        props.onSelect?.();
      }}
    />
  );
}
