/**
 * The standing caution at the top of every memo. Resampling answers are approximations
 * whose quality depends on the sample; readers must not take them as more than that.
 */
export function CautionBanner() {
  return (
    <aside role="note" aria-label="Caution about resampling results" className="rounded-md border border-amber/30 bg-amber-wash/50 px-4 py-3 text-sm text-ink-soft">
      <p>
        <strong className="font-medium text-ink">Read these numbers with care.</strong> Resampling intervals are approximate: their coverage can fall short of the stated
        level, most of all for small samples, skewed data and statistics such as the maximum. Small samples and dependent observations (repeated measures, clusters, series)
        need particular care and the matching resampling scheme. Results that inform clinical, safety or regulatory decisions need review by a qualified statistician and must
        follow the applicable local rules.
      </p>
    </aside>
  );
}
