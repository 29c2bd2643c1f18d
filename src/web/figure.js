// Draws the write-up's figure (a vega-lite specification from POST /api/report) with
// the vega and vega-lite builds the server hands out from its own packages.

let current;

/** Renders `spec` into `container` as SVG; resolves when drawn. */
export async function drawFigure(container, spec) {
  const { vega, vegaLite } = globalThis;
  if (!vega || !vegaLite) {
    container.textContent = 'The figure library did not load; the SVG download still works.';
    return;
  }
  if (current) current.finalize();
  container.replaceChildren();
  const compiled = vegaLite.compile(spec).spec;
  current = new vega.View(vega.parse(compiled), { renderer: 'svg', container, hover: true, logLevel: vega.Warn });
  await current.runAsync();
}
