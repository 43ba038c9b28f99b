import { useEffect, useRef } from 'react';
import { trapTab } from './focusTrap';

interface Props {
  readonly title: string;
  readonly lines: readonly string[];
  readonly onClose: () => void;
}

/** About Flankfilm, and Methods and sources: the assumptions of this review, then every formula with its source. */
export function InfoDialog({ title, lines, onClose }: Props) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    if (ref.current && !ref.current.open) ref.current.showModal();
  }, []);
  return (
    <dialog ref={ref} className="dialog" aria-labelledby="info-title" onClose={onClose} onKeyDown={trapTab}>
      <h2 id="info-title">{title}</h2>
      <ul>
        {lines.map((l) => (
          <li key={l}>{l}</li>
        ))}
      </ul>
      <div className="dialog__buttons">
        <button type="button" className="primary" onClick={() => ref.current?.close()}>Close</button>
      </div>
    </dialog>
  );
}
