import { Link } from 'react-router-dom';

export function NotFoundRoute() {
  return (
    <section className="space-y-3">
      <h1 className="text-2xl font-semibold">Page not found</h1>
      <p className="text-ink-700">There is no page at this address.</p>
      <Link to="/" className="text-seaglass-700 underline">
        Back to the overview
      </Link>
    </section>
  );
}
