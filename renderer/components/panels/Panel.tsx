import type { ReactNode } from 'react';

interface Props {
  readonly id: string;
  readonly title: string;
  readonly children: ReactNode;
  readonly actions?: ReactNode;
  readonly className?: string;
}

/** A titled region of the sheet; its heading names it for assistive technology. */
export function Panel({ id, title, children, actions, className }: Props) {
  return (
    <section id={id} className={`panel${className ? ` ${className}` : ''}`} aria-labelledby={`${id}-h`} data-panel={id}>
      <header className="panel__head">
        <h2 id={`${id}-h`}>{title}</h2>
        {actions ? <div className="panel__actions">{actions}</div> : null}
      </header>
      <div className="panel__body">{children}</div>
    </section>
  );
}
