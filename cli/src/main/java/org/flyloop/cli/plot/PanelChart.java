package org.flyloop.cli.plot;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.XYStyler;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * One panel of a figure as an XChart {@link XYChart}: traces, reference lines, band edges and
 * markers become series, labels become text annotations, and the styler carries flyloop's look
 * ({@link PlotTheme}) instead of the library's theme. Both axes get explicit ranges so that the
 * panels of one figure line up and a drawn pixel can be mapped back to the value it shows.
 */
final class PanelChart {

    /** Room for the y tick labels and title, px; the same on every panel so the plot areas align. */
    static final int Y_AXIS_WIDTH = 70;
    /** Points between two glyphs on an ordinary trace: enough to tell traces apart, few enough not to clutter. */
    private static final int GLYPHS_PER_TRACE = 9;
    /** Decade tick labels on a logarithmic axis: "100", "1,000", "10,000". */
    static final String DECADE_PATTERN = "#,##0";

    private final Panel panel;
    private final AxisRange x;
    private final AxisRange y;
    private final AxisUnit xUnit;
    private final AxisUnit yUnit;
    private final XYChart chart;
    private final List<String> labels = new ArrayList<>();
    private final List<PaintedLayer.ShapeTag> markerTags = new ArrayList<>();
    private int hiddenSeries;

    /**
     * @param figure     the figure the panel belongs to
     * @param panel      the panel
     * @param x          shared x range
     * @param y          this panel's y range
     * @param xUnit      display unit of the shared x axis
     * @param looks      the look of every trace name in the figure
     * @param width      chart width, px
     * @param height     chart height, px
     * @param bottomMost true for the panel that carries the x title and the legend
     * @param topMost    true for the panel that carries the labels of vertical lines
     */
    PanelChart(Figure figure, Panel panel, AxisRange x, AxisRange y, AxisUnit xUnit,
               Map<String, PlotTheme.TraceLook> looks, int width, int height, boolean bottomMost, boolean topMost) {
        this.panel = panel;
        this.x = x;
        this.y = y;
        this.xUnit = xUnit;
        double yBig = Math.max(Math.abs(y.min()), Math.abs(y.max()));
        this.yUnit = AxisUnit.of(panel.unit(), yBig, panel.scale() == Scale.LINEAR);
        chart = new XYChartBuilder().width(width).height(height)
                .xAxisTitle(bottomMost ? xUnit.title(figure.xQuantity()) : "")
                .yAxisTitle(yUnit.title(panel.quantity())).build();
        style(bottomMost);
        addReferenceLines(figure.verticals(), topMost);
        addBands();
        for (Emphasis pass : new Emphasis[] {Emphasis.NORMAL, Emphasis.STRONG}) {
            for (Trace t : panel.traces()) {
                if (t.emphasis() == pass) {
                    addTrace(t, looks.get(t.name()), looks.size());
                }
            }
        }
        addMarkers();
        if (bottomMost) {
            addLegendOnlyEntries(looks);
        }
    }

    /**
     * The legend sits under the bottom panel but names every trace of the figure; a trace drawn
     * only in upper panels gets a one-point series with no finite value, which XChart lists in the
     * legend and draws nowhere.
     */
    private void addLegendOnlyEntries(Map<String, PlotTheme.TraceLook> looks) {
        List<String> here = panel.traces().stream().map(Trace::name).toList();
        for (Map.Entry<String, PlotTheme.TraceLook> e : looks.entrySet()) {
            if (!here.contains(e.getKey())) {
                XYSeries s = chart.addSeries(e.getKey(), new double[] {x.min()}, new double[] {Double.NaN});
                s.setLineStyle(stroke(e.getValue().line()));
                s.setLineColor(PlotTheme.color(e.getValue().line().color()));
                s.setMarker(SeriesMarkers.NONE);
            }
        }
    }

    XYChart chart() {
        return chart;
    }

    /**
     * Paints the chart and reports the panel's geometry as data attributes (the axis ranges, the
     * pixels XChart maps the range ends to, box-local, and the texts it drew as outlines), its
     * markers as named shapes, and a description naming the traces and notes.
     */
    PaintedLayer paint(Graphics2D g) {
        chart.paint(g, chart.getWidth(), chart.getHeight());
        Map<String, String> data = new LinkedHashMap<>();
        data.put("name", panel.name());
        data.put("x-scale", x.scale() == Scale.LOG ? "log" : "linear");
        data.put("x-min", Double.toString(x.min()));
        data.put("x-max", Double.toString(x.max()));
        data.put("y-min", Double.toString(y.min()));
        data.put("y-max", Double.toString(y.max()));
        data.put("left", Double.toString(chart.getScreenXFromChart(x.min())));
        data.put("right", Double.toString(chart.getScreenXFromChart(x.max())));
        data.put("top", Double.toString(chart.getScreenYFromChart(y.max())));
        data.put("bottom", Double.toString(chart.getScreenYFromChart(y.min())));
        if (!chart.getXAxisTitle().isEmpty()) {
            data.put("x-title", chart.getXAxisTitle());
        }
        data.put("y-title", chart.getYAxisTitle());
        // XChart draws text as outlines; the words stay readable to search and screen readers here.
        data.put("labels", String.join("|", labels));
        List<String> names = panel.traces().stream().map(Trace::name).distinct().toList();
        data.put("traces", String.join("|", names));
        String description = chart.getYAxisTitle() + ": " + String.join(", ", names)
                + (labels.isEmpty() ? "" : "; " + String.join("; ", labels));
        return new PaintedLayer(data, markerTags, description);
    }

    private void style(boolean bottomMost) {
        XYStyler s = chart.getStyler();
        Color paper = PlotTheme.color(PlotTheme.PAPER);
        Color ink = PlotTheme.color(PlotTheme.INK);
        s.setChartBackgroundColor(paper);
        s.setPlotBackgroundColor(paper);
        s.setChartFontColor(ink);
        s.setChartTitleVisible(false);
        s.setChartPadding(6);
        s.setPlotBorderVisible(true);
        s.setPlotBorderColor(PlotTheme.color(PlotTheme.FRAME));
        s.setPlotMargin(0);
        s.setPlotContentSize(1.0);
        s.setPlotGridLinesVisible(true);
        s.setPlotGridLinesColor(PlotTheme.color(PlotTheme.GRID_MAJOR));
        s.setPlotGridLinesStroke(new BasicStroke(0.7f));
        s.setAxisTickMarksColor(PlotTheme.color(PlotTheme.FRAME));
        s.setAxisTickLabelsColor(ink);
        s.setAxisTitleFont(font(PlotTheme.AXIS_LABEL_SIZE, Font.PLAIN));
        s.setAxisTickLabelsFont(font(PlotTheme.TICK_SIZE, Font.PLAIN));
        s.setAxisTitlePadding(6);
        s.setXAxisTitleVisible(bottomMost);
        s.setYAxisLeftWidthHint(Y_AXIS_WIDTH);
        s.setLegendVisible(bottomMost);
        s.setLegendPosition(Styler.LegendPosition.OutsideS);
        s.setLegendLayout(Styler.LegendLayout.Vertical);
        s.setLegendBackgroundColor(paper);
        s.setLegendBorderColor(paper);
        s.setLegendFont(font(PlotTheme.LEGEND_SIZE, Font.PLAIN));
        s.setLegendSeriesLineLength(38);
        s.setAnnotationTextFont(font(PlotTheme.ANNOTATION_SIZE, Font.PLAIN));
        s.setAnnotationTextFontColor(ink);
        s.setMarkerSize(9);
        s.setToolTipsEnabled(false);
        s.setCursorEnabled(false);
        s.setAntiAlias(true);
        s.setLocale(Locale.ROOT);
        s.setXAxisMin(x.min());
        s.setXAxisMax(x.max());
        s.setYAxisMin(y.min());
        s.setYAxisMax(y.max());
        s.setYAxisTickMarkSpacingHint(28);
        if (x.scale() == Scale.LOG) {
            s.setXAxisLogarithmic(true);
            s.setXAxisLogarithmicDecadeOnly(true);
            // A custom label function would make XChart 3.8.8 fall back to linear ticks; a
            // pattern keeps the decade ticks and writes 10000 as "10,000".
            s.setXAxisDecimalPattern(DECADE_PATTERN);
        } else {
            s.setxAxisTickLabelsFormattingFunction(v -> SiText.plain(v * xUnit.factor(), 4));
        }
        s.setyAxisTickLabelsFormattingFunction(v -> SiText.plain(v * yUnit.factor(), 4));
    }

    private void addTrace(Trace t, PlotTheme.TraceLook look, int lookCount) {
        double[] xs = t.x();
        double[] ys = t.y();
        for (int i = 0; i < xs.length; i++) {
            // A non-finite or non-positive (on a log axis) point becomes a gap in the line.
            if (!Double.isFinite(xs[i]) || (x.scale() == Scale.LOG && xs[i] <= 0) || !Double.isFinite(ys[i])) {
                xs[i] = i > 0 ? xs[i - 1] : x.min();
                ys[i] = Double.NaN;
            }
        }
        XYSeries s = chart.addSeries(t.name(), xs, ys);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setLineStyle(stroke(look.line()));
        s.setLineColor(PlotTheme.color(look.line().color()));
        s.setMarker(SeriesMarkers.NONE);
        if (look.glyph() != PlotTheme.Glyph.NONE) {
            addGlyphs(xs, ys, look, lookCount);
        }
    }

    /** Sparse glyphs along an ordinary trace, so it can be told apart in greyscale. */
    private void addGlyphs(double[] xs, double[] ys, PlotTheme.TraceLook look, int lookCount) {
        int stride = Math.max(1, xs.length / GLYPHS_PER_TRACE);
        int offset = (look.glyph().ordinal() * stride) / Math.max(1, lookCount + 1);
        int n = 0;
        double[] gx = new double[xs.length / stride + 1];
        double[] gy = new double[gx.length];
        for (int i = offset; i < xs.length && n < gx.length; i += stride) {
            if (Double.isFinite(ys[i]) && y.contains(ys[i])) {
                gx[n] = xs[i];
                gy[n++] = ys[i];
            }
        }
        if (n == 0) {
            return;
        }
        XYSeries s = hidden(java.util.Arrays.copyOf(gx, n), java.util.Arrays.copyOf(gy, n));
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        s.setMarker(PlotTheme.seriesMarker(look.glyph()));
        s.setMarkerColor(PlotTheme.color(look.line().color()));
    }

    private void addReferenceLines(List<ReferenceLine> verticals, boolean labelled) {
        for (ReferenceLine g : panel.guides()) {
            if (y.contains(g.value())) {
                line(new double[] {x.min(), x.max()}, new double[] {g.value(), g.value()}, lineFor(g.kind()));
                if (!g.label().isEmpty()) {
                    annotate(g.label(), x.scale() == Scale.LOG ? x.min() * 1.6 : x.min() + 0.06 * (x.max() - x.min()),
                            g.value() + 0.04 * (y.max() - y.min()));
                }
            }
        }
        for (ReferenceLine v : verticals) {
            if (x.contains(v.value())) {
                line(new double[] {v.value(), v.value()}, new double[] {y.min(), y.max()}, lineFor(v.kind()));
                if (labelled && !v.label().isEmpty()) {
                    // Left of the line, so the line does not strike through the text.
                    annotate(v.label(), shiftX(v.value(), -(halfWidthPx(v.label()) + 5)),
                            y.max() - 0.07 * (y.max() - y.min()));
                }
            }
        }
    }

    private void addBands() {
        for (Band b : panel.bands()) {
            for (double v : new double[] {b.low(), b.high()}) {
                if (y.contains(v)) {
                    line(new double[] {x.min(), x.max()}, new double[] {v, v}, PlotTheme.BAND_EDGE);
                }
            }
            if (!b.label().isEmpty() && y.contains(b.high())) {
                double at = x.scale() == Scale.LOG ? x.max() / 3 : x.max() - 0.1 * (x.max() - x.min());
                annotate(b.label(), at, b.high() + 0.05 * (y.max() - y.min()));
            }
        }
    }

    private void addMarkers() {
        for (Marker m : panel.markers()) {
            if (!x.contains(m.x()) || !y.contains(m.y())) {
                continue;
            }
            XYSeries s = hidden(new double[] {m.x()}, new double[] {m.y()});
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            s.setMarker(PlotTheme.seriesMarker(PlotTheme.glyphFor(m.kind())));
            s.setMarkerColor(PlotTheme.color(PlotTheme.markerInk(m.kind())));
            Map<String, String> data = new LinkedHashMap<>();
            data.put("x", Double.toString(m.x()));
            data.put("y", Double.toString(m.y()));
            data.put("label", m.label());
            markerTags.add(new PaintedLayer.ShapeTag(PlotTheme.markerInk(m.kind()), "marker " + m.kind().cssClass(),
                    data));
            if (m.labelled()) {
                // Above the point, or below it when the point is near the top of the panel.
                // Right of the point and a little above it; left of it near the right edge.
                double reach = 2 * halfWidthPx(m.label()) + 12;
                double dx = shiftX(m.x(), reach) > x.max() ? -(halfWidthPx(m.label()) + 9) : halfWidthPx(m.label()) + 9;
                double span = y.max() - y.min();
                double dy = m.y() + 0.1 * span > y.max() ? -0.06 * span : 0.06 * span;
                annotate(m.label(), shiftX(m.x(), dx), m.y() + dy);
            }
        }
    }

    private void line(double[] xs, double[] ys, LineStyle look) {
        XYSeries s = hidden(xs, ys);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setLineStyle(stroke(look));
        s.setLineColor(PlotTheme.color(look.color()));
        s.setMarker(SeriesMarkers.NONE);
    }

    /** A series kept out of the legend; XChart needs unique names, which nobody sees. */
    private XYSeries hidden(double[] xs, double[] ys) {
        XYSeries s = chart.addSeries("\u2060" + (hiddenSeries++), xs, ys);
        s.setShowInLegend(false);
        return s;
    }

    /** Half the width of a label, px, from the font's average advance (close enough to place it). */
    private static double halfWidthPx(String text) {
        return 0.5 * 0.56 * PlotTheme.ANNOTATION_SIZE * text.length();
    }

    /** {@code value} moved by about {@code px} pixels along the x axis (the plot area is estimated). */
    private double shiftX(double value, double px) {
        double plotPx = chart.getWidth() - Y_AXIS_WIDTH - 12.0;
        double fraction = px / plotPx;
        return x.scale() == Scale.LOG ? value * Math.pow(x.max() / x.min(), fraction)
                : value + fraction * (x.max() - x.min());
    }

    private void annotate(String text, double atX, double atY) {
        chart.addAnnotation(new AnnotationText(text, atX, atY, false));
        labels.add(text);
    }

    static BasicStroke stroke(LineStyle look) {
        double[] d = look.dash();
        if (d.length == 0) {
            // Round caps: XChart strokes a line segment by segment, and butt ends leave the
            // joints of a dense, thick trace looking grey.
            return new BasicStroke((float) look.width(), BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
        }
        float[] f = new float[d.length];
        for (int i = 0; i < d.length; i++) {
            f[i] = (float) d[i];
        }
        return new BasicStroke((float) look.width(), BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10, f, 0);
    }

    private static Font font(double size, int weight) {
        return new Font(PlotTheme.AWT_FONT_FAMILY, weight, 1).deriveFont((float) size);
    }

    private static LineStyle lineFor(ReferenceLine.Kind kind) {
        return switch (kind) {
            case LIMIT -> PlotTheme.LIMIT_LINE;
            case GUIDE -> PlotTheme.GUIDE_LINE;
            case CURSOR -> PlotTheme.CURSOR_LINE;
        };
    }
}
