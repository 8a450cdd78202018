import { Link } from 'react-router-dom';

const linkClass = 'rounded-md border border-ink-faint bg-white px-3 py-1.5 font-medium text-ink hover:bg-paper-deep';

/**
 * Presets on the design screen. HOOK for the presets feature (issue 5): "start from a preset" and "save as
 * a preset" link to its page for now; once its API lands, load and save the form's values here.
 */
export function PresetHook({ signedIn }: { signedIn: boolean }) {
  if (!signedIn) {
    return (
      <p className="text-sm text-ink-soft">
        <Link to="/sign-in" className="font-medium text-ink underline underline-offset-4">
          Sign in
        </Link>{' '}
        to save this setup as a preset and keep a history of your kits.
      </p>
    );
  }
  return (
    <div className="flex flex-wrap gap-2" data-hook="presets">
      <Link to="/presets" className={linkClass}>
        Start from a preset
      </Link>
      <Link to="/presets?save=design" className={linkClass}>
        Save as a preset
      </Link>
    </div>
  );
}
