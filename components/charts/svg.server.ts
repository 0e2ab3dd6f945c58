import 'server-only';
import { parse, View } from 'vega';
import { compile, type TopLevelSpec } from 'vega-lite';

/**
 * Renders a Vega-Lite spec to SVG text on the server: compile to Vega, run a headless view
 * (renderer "none"), and ask for its SVG. The same spec the browser draws, so an exported
 * figure matches the screen.
 */
export async function renderSvg(spec: TopLevelSpec): Promise<string> {
  const vg = compile(spec).spec;
  const view = new View(parse(vg), { renderer: 'none' });
  try {
    return await view.toSVG();
  } finally {
    view.finalize();
  }
}
