import type { Caution } from '../../../app/review/results';

/** Cautions, always shown (never folded away); "defer to the maker, codes and a licensed engineer" is one of them. */
export function CautionList({ cautions, label }: { readonly cautions: readonly Caution[]; readonly label: string }) {
  if (!cautions.length) return null;
  return (
    <ul className="cautions" aria-label={label}>
      {cautions.map((k) => (
        <li key={k.id} className={`caution caution--${k.kind}`} data-caution={k.id}>
          <span aria-hidden="true" className="caution__icon">⚠</span>
          <span>{k.text}</span>
        </li>
      ))}
    </ul>
  );
}
