/** What the lab does, in a few lines, for the home page. */
export function LabStatement() {
  return (
    <section aria-labelledby="what-we-do" className="max-w-measure space-y-4">
      <h2 id="what-we-do" className="sr-only">
        What we do
      </h2>
      <p className="text-xl leading-relaxed text-ink">
        A single irradiance figure taken at one spot says little about the light a body receives. We put red and
        near-infrared light-therapy panels, pads and caps on a measuring bench and map their output.
      </p>
      <p className="text-ink-soft">For every unit we test, we report:</p>
      <ul className="list-disc space-y-1.5 pl-6 text-ink-soft marker:text-signal">
        <li>irradiance in each band, red and near-infrared, at points across the face of the unit;</li>
        <li>the same grid at several distances, so you see how the light falls off as you step back;</li>
        <li>how much of an adult body the unit really covers, and how even that coverage is;</li>
        <li>how long a session takes to reach a given dose at each distance.</li>
      </ul>
      <p className="text-ink-soft">
        Every run is checked by an editor before it is published, and the data behind each report can be
        downloaded.
      </p>
    </section>
  );
}
