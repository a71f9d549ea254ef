/**
 * Beside every table or chart of irradiance: what the figures are and are not, pointing to the
 * full cautions at the foot of each public page (PublicFooter gives them the id "site-cautions").
 */
export function MeasurementsNote() {
  return (
    <p className="max-w-measure border-l-4 border-warn pl-4 font-sans text-sm text-ink-soft">
      These figures are measurements of devices, not treatment advice. Protect your eyes and never look into the
      emitters; near-infrared is invisible, so the blink reflex may not protect you. Local regulations and licensed
      practice come first. <a href="#site-cautions">Read all the cautions</a>.
    </p>
  );
}
