import { Link } from 'react-router-dom';
import { JointIllustration } from './joint-illustration';

const points = [
  {
    title: 'Keys and pockets',
    text: 'Square, rectangular, round or hexagonal keys, laid out on your cut face with walls that hold.',
  },
  { title: 'Sliding dovetails', text: 'Rails on one half, slots in the other, at the flare and spacing you choose.' },
  {
    title: 'A fit you can trust',
    text: 'Clearance from your material, the fit you want and your printer’s own fit test, with the reasoning shown.',
  },
];

/** The home page: what Seamwright does, one picture of it, and the way in. */
export function HomeHero() {
  return (
    <div className="space-y-12">
      <section className="grid items-center gap-8 lg:grid-cols-[1fr_1.1fr]">
        <div className="space-y-5">
          <h1 className="text-title font-bold sm:text-5xl sm:leading-tight">
            Join printed parts that line up and hold
          </h1>
          <p className="text-lead text-ink-soft">
            When a model is bigger than your printer, Seamwright builds the matching registration keys, pockets and
            dovetail rails for the cut face, sized for your material, fit and printer. Check them in 3D, then download a
            kit of STL files to merge into your model.
          </p>
          <div className="flex flex-wrap gap-3">
            <Link to="/design" className="rounded-md bg-kiln px-6 py-3 text-lead font-semibold text-white hover:bg-ink">
              Start designing
            </Link>
            <span className="self-center text-ink-soft">No account needed.</span>
          </div>
        </div>
        <div className="rounded-card border border-paper-deep bg-white/70 p-4">
          <JointIllustration />
        </div>
      </section>
      <section aria-labelledby="what-title" className="space-y-4">
        <h2 id="what-title" className="text-lead font-bold">
          What you get
        </h2>
        <ul className="grid gap-4 sm:grid-cols-3">
          {points.map((p) => (
            <li key={p.title} className="rounded-card border border-paper-deep bg-white p-4">
              <p className="font-bold">{p.title}</p>
              <p className="text-ink-soft">{p.text}</p>
            </li>
          ))}
        </ul>
      </section>
    </div>
  );
}
