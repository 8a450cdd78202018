import { Link } from 'react-router-dom';

/** Shown for any address the app does not know. */
export function NotFoundRoute() {
  return (
    <section className="max-w-xl space-y-4">
      <h1 className="text-title font-bold">Page not found</h1>
      <p className="text-ink-soft">There is nothing at this address. It may have moved, or the link may be mistyped.</p>
      <Link to="/" className="inline-block rounded-md bg-kiln px-4 py-2 font-medium text-white hover:bg-ink">
        Back to the start
      </Link>
    </section>
  );
}
