'use client';

import { VegaEmbed } from 'react-vega';
import type { TopLevelSpec } from 'vega-lite';

/**
 * A Vega-Lite chart in the browser (react-vega's VegaEmbed), rendered as SVG so it matches
 * the server's export exactly. The spec comes from the block's pure chart.ts.
 */
export function VegaChart({ spec, label }: { spec: TopLevelSpec; label: string }) {
  return (
    <figure aria-label={label} className="overflow-x-auto">
      <VegaEmbed spec={spec as never} options={{ renderer: 'svg', actions: false, ast: false }} />
    </figure>
  );
}
