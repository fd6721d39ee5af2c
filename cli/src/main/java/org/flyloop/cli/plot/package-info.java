/**
 * Plots: Bode figures (magnitude over phase on one shared logarithmic frequency axis), step and
 * transient figures, and the model-agreement figure, each rendered to SVG and to PNG.
 *
 * <p>Inputs are plain data ({@link org.flyloop.cli.plot.Trace}, {@link org.flyloop.cli.plot.Marker},
 * {@link org.flyloop.cli.plot.ReferenceLine}, {@link org.flyloop.cli.plot.Band}) so a figure can be
 * built without running a design. The drawing goes through one {@link org.flyloop.cli.plot.Canvas}
 * with two back ends, so the SVG and the PNG of a figure are the same picture. The SVG carries its
 * geometry as data attributes (axis ranges and plot-area pixels on every panel, the value of every
 * marker), which lets a reader map any drawn point back to the quantity it stands for.
 *
 * <p>The look is our own and meant for paper: black and greys with a few muted colours, every
 * trace also told apart by its dash pattern and glyphs, so a greyscale print stays readable.
 */
package org.flyloop.cli.plot;
