import { useEffect, useRef } from 'react';

export const CAUTIONS_ID = 'cautions';

/** The standing safety notice; dismissable, and reopened from the header. */
export function Cautions({ open, onDismiss }: { open: boolean; onDismiss(): void }) {
  const section = useRef<HTMLElement>(null);
  const wasOpen = useRef(open);
  useEffect(() => {
    // Move focus only when reopened, not on the first render.
    if (open && !wasOpen.current) section.current?.focus();
    wasOpen.current = open;
  }, [open]);
  if (!open) return null;
  return (
    <section
      id={CAUTIONS_ID}
      ref={section}
      tabIndex={-1}
      className="cautions"
      aria-labelledby="cautions-title"
    >
      <div className="cautions-text">
        <h2 id="cautions-title">Cautions</h2>
        <p>
          Synchrotron light is ionizing radiation, and RF fields have exposure limits. Conecast
          computes idealised fields of point charges in vacuum; it is not a shielding, dose or
          exposure assessment. Follow local codes, your facility's radiation-safety officer and
          licensed practice.
        </p>
      </div>
      <button type="button" className="cautions-dismiss" onClick={onDismiss}>
        Dismiss cautions
      </button>
    </section>
  );
}
