/** The landing page: what Seamwright does, in two sentences. */
export function HomeRoute() {
  return (
    <section className="max-w-3xl space-y-4">
      <h1 className="text-title font-bold">Join printed parts that line up and hold</h1>
      <p className="text-lead text-ink-soft">
        When a model is bigger than your printer, Seamwright builds the matching registration keys, pockets and dovetail
        rails for the cut face, sized for your material, fit and printer. Check them in 3D, then download a kit of STL
        files to merge into your model.
      </p>
    </section>
  );
}
