import { Link } from 'react-router-dom';
import { buttonClasses } from './button';

/** Props of NotFound. */
export interface NotFoundProps {
  /** The page heading, e.g. "Page not found". */
  title: string;
  /** Why, in one sentence. */
  message: string;
}

/** The body of a 404 page, with a way back to the missions. */
export function NotFound({ title, message }: NotFoundProps) {
  return (
    <section className="max-w-xl py-10">
      <p className="font-mono text-sm text-sodium-strong">404</p>
      <h1 className="mt-1 text-2xl font-semibold">{title}</h1>
      <p className="mt-2 text-ink-soft">{message}</p>
      <Link to="/missions" className={buttonClasses('secondary', 'md') + ' mt-6'}>
        Back to missions
      </Link>
    </section>
  );
}
