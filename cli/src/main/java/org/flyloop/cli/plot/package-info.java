/**
 * Plots: Bode figures (magnitude over phase on one shared logarithmic frequency axis), step and
 * transient figures, and the model-agreement figure, each rendered to SVG and to PNG.
 *
 * <p>Inputs are plain data ({@link org.flyloop.cli.plot.Trace}, {@link org.flyloop.cli.plot.Marker},
 * {@link org.flyloop.cli.plot.ReferenceLine}, {@link org.flyloop.cli.plot.Band}) so a figure can be
 * built without running a design. Every panel is drawn by XChart ({@link org.flyloop.cli.plot.PanelChart},
 * an {@code XYChart} with our own styling, never the library theme) and painted through one
 * {@link org.flyloop.cli.plot.Canvas} with two back ends: Java2D into an image for the PNG, and
 * VectorGraphics2D recorded into SVG for the vector picture, so both are the same picture. The SVG
 * carries its geometry as data attributes (axis ranges and plot-area pixels on every panel, the
 * value and label of every marker), which lets a reader map any drawn point back to the quantity it
 * stands for; the same canvas also draws hand-laid pictures such as the compensator schematic.
 *
 * <p>Annotation labels are not XChart annotations: once XChart has laid out a panel,
 * {@link org.flyloop.cli.plot.LabelPlacer} puts each label in a white, thin-bordered box inside the
 * plot area, clear of the other labels and of the marker glyphs, where it crosses the fewest drawn
 * lines. The legend ({@link org.flyloop.cli.plot.LegendBlock}) is laid out in columns under the
 * bottom panel, the emphasised trace first.
 *
 * <p>The look is our own and meant for paper: white ground, black and greys with a few muted
 * colours, the trace that matters thick and solid, every other trace thin, dashed and carrying its
 * own glyphs, so a greyscale print stays readable.
 */
package org.flyloop.cli.plot;
