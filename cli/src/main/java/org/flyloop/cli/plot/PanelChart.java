package org.flyloop.cli.plot;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
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
    /** Half the side of the square kept clear around a marker glyph, px. */
    private static final double MARKER_CLEARANCE = 7;
    private static final double BOX_PAD_X = 4;
    private static final double BOX_PAD_Y = 2;

    private final Panel panel;
    private final AxisRange x;
    private final AxisRange y;
    private final AxisUnit xUnit;
    private final AxisUnit yUnit;
    private final XYChart chart;
    private final List<String> labels = new ArrayList<>();
    private final List<PaintedLayer.ShapeTag> markerTags = new ArrayList<>();
    private final List<PendingLabel> pending = new ArrayList<>();
    /** Every drawn line in data units, so labels can keep clear of them. */
    private final List<double[][]> drawnLines = new ArrayList<>();
    private final LegendBlock legend;
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
     * @param legend     the legend drawn under this panel's chart, or null
     */
    PanelChart(Figure figure, Panel panel, AxisRange x, AxisRange y, AxisUnit xUnit,
               Map<String, PlotTheme.TraceLook> looks, int width, int height, boolean bottomMost, boolean topMost,
               LegendBlock legend) {
        this.panel = panel;
        this.legend = legend;
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
        paintLabels(g);
        if (legend != null) {
            legend.paint(g, chart.getHeight());
        }
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
        // The legend is drawn by LegendBlock in columns; XChart's own would be one long list.
        s.setLegendVisible(false);
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
        double[][] drawn = decimate(xs, ys, MAX_DRAWN_POINTS);
        xs = drawn[0];
        ys = drawn[1];
        XYSeries s = chart.addSeries(t.name(), xs, ys);
        drawnLines.add(new double[][] {xs, ys});
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setLineStyle(stroke(look.line()));
        s.setLineColor(PlotTheme.color(look.line().color()));
        s.setMarker(SeriesMarkers.NONE);
        if (look.glyph() != PlotTheme.Glyph.NONE) {
            addGlyphs(xs, ys, look, lookCount);
        }
    }

    /** Points drawn per trace at most; the CSV files keep every point. */
    static final int MAX_DRAWN_POINTS = 900;

    /**
     * At most about {@code max} points of a trace for drawing: the samples are cut into buckets in
     * index order and each bucket keeps its first point and its lowest and highest y, in order, so
     * peaks and gaps (NaN) survive; a figure is a few hundred pixels wide, so nothing visible is lost
     * while the SVG shrinks several-fold.
     */
    static double[][] decimate(double[] xs, double[] ys, int max) {
        int n = xs.length;
        if (n <= max) {
            return new double[][] {xs, ys};
        }
        int buckets = max / 3;
        java.util.List<Integer> keep = new java.util.ArrayList<>();
        for (int b = 0; b < buckets; b++) {
            int from = (int) ((long) b * n / buckets);
            int to = (int) ((long) (b + 1) * n / buckets);
            int lo = from;
            int hi = from;
            int gap = -1;
            for (int i = from; i < to; i++) {
                if (Double.isNaN(ys[i])) {
                    gap = gap < 0 ? i : gap;
                    continue;
                }
                if (Double.isNaN(ys[lo]) || ys[i] < ys[lo]) {
                    lo = i;
                }
                if (Double.isNaN(ys[hi]) || ys[i] > ys[hi]) {
                    hi = i;
                }
            }
            java.util.TreeSet<Integer> chosen = new java.util.TreeSet<>(java.util.List.of(from, lo, hi));
            if (gap >= 0) {
                chosen.add(gap);
            }
            keep.addAll(chosen);
        }
        keep.add(n - 1);
        double[] x = new double[keep.size()];
        double[] y = new double[keep.size()];
        int k = 0;
        int last = -1;
        for (int i : keep) {
            if (i == last) {
                continue;
            }
            x[k] = xs[i];
            y[k] = ys[i];
            k++;
            last = i;
        }
        return new double[][] {java.util.Arrays.copyOf(x, k), java.util.Arrays.copyOf(y, k)};
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
                    annotate(g.label(), LabelKind.GUIDE, x.min(), g.value());
                }
            }
        }
        for (ReferenceLine v : verticals) {
            if (x.contains(v.value())) {
                line(new double[] {v.value(), v.value()}, new double[] {y.min(), y.max()}, lineFor(v.kind()));
                if (labelled && !v.label().isEmpty()) {
                    annotate(v.label(), LabelKind.VERTICAL, v.value(), y.max());
                }
            }
        }
    }

    private void addBands() {
        for (Band b : panel.bands()) {
            double low = Math.max(b.low(), y.min());
            double high = Math.min(b.high(), y.max());
            if (low < high) {
                // A closed polygon over the band, added before the traces so they draw over it.
                XYSeries fill = hidden(new double[] {x.min(), x.max(), x.max(), x.min()},
                        new double[] {low, low, high, high});
                fill.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.PolygonArea);
                fill.setFillColor(PlotTheme.color(PlotTheme.BAND_FILL));
                fill.setLineColor(PlotTheme.color(PlotTheme.BAND_FILL));
                fill.setLineStyle(new BasicStroke(0f));
                fill.setMarker(SeriesMarkers.NONE);
            }
            for (double v : new double[] {b.low(), b.high()}) {
                if (y.contains(v)) {
                    line(new double[] {x.min(), x.max()}, new double[] {v, v}, PlotTheme.BAND_EDGE);
                }
            }
            if (!b.label().isEmpty() && y.contains(b.high())) {
                annotate(b.label(), LabelKind.BAND, x.max(), b.high());
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
            pending.add(new PendingLabel(m.label(), LabelKind.MARKER, m.x(), m.y()));
            if (m.labelled()) {
                labels.add(m.label());
            }
        }
    }

    private void line(double[] xs, double[] ys, LineStyle look) {
        drawnLines.add(new double[][] {xs, ys});
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

    private void annotate(String text, LabelKind kind, double atX, double atY) {
        pending.add(new PendingLabel(text, kind, atX, atY));
        labels.add(text);
    }

    /**
     * Draws the labels in white, thin-bordered boxes where {@link LabelPlacer} finds room: marker
     * labels first (closest to their points), then those of vertical lines, bands and guides. Every
     * marker glyph is kept uncovered and boxes avoid the drawn lines where they can.
     */
    private void paintLabels(Graphics2D g) {
        double left = chart.getScreenXFromChart(x.min());
        double right = chart.getScreenXFromChart(x.max());
        double top = chart.getScreenYFromChart(y.max());
        double bottom = chart.getScreenYFromChart(y.min());
        LabelPlacer placer = new LabelPlacer(left, top, right, bottom);
        for (double[][] l : drawnLines) {
            double[] px = new double[l[0].length];
            double[] py = new double[px.length];
            for (int i = 0; i < px.length; i++) {
                px[i] = Double.isFinite(l[1][i]) ? chart.getScreenXFromChart(l[0][i]) : Double.NaN;
                py[i] = Double.isFinite(l[1][i]) ? chart.getScreenYFromChart(l[1][i]) : Double.NaN;
            }
            placer.ink(px, py);
        }
        for (PendingLabel p : pending) {
            if (p.kind() == LabelKind.MARKER) {
                double half = MARKER_CLEARANCE;
                placer.reserve(chart.getScreenXFromChart(p.x()) - half, chart.getScreenYFromChart(p.y()) - half,
                        2 * half, 2 * half);
            }
        }
        TextStyle style = TextStyle.plain(PlotTheme.ANNOTATION_SIZE, PlotTheme.INK);
        Graphics2D g2 = (Graphics2D) g.create();
        g2.setFont(TextMeasure.font(style));
        FontMetrics fm = g2.getFontMetrics();
        for (LabelKind kind : LabelKind.values()) {
            for (PendingLabel p : pending) {
                if (p.kind() != kind || p.text().isEmpty()) {
                    continue;
                }
                double w = TextMeasure.width(p.text(), style) + 2 * BOX_PAD_X;
                double h = fm.getAscent() + fm.getDescent() + 2 * BOX_PAD_Y;
                double ax = chart.getScreenXFromChart(p.x());
                double ay = chart.getScreenYFromChart(p.y());
                double[] at = placer.place(spots(kind, ax, ay, w, h, left, top, right, bottom), w, h);
                Rectangle2D box = new Rectangle2D.Double(at[0], at[1], w, h);
                g2.setColor(PlotTheme.color(PlotTheme.PAPER));
                g2.fill(box);
                g2.setColor(PlotTheme.color(PlotTheme.LABEL_BORDER));
                g2.setStroke(new BasicStroke(0.8f));
                g2.draw(box);
                g2.setColor(PlotTheme.color(PlotTheme.INK));
                g2.drawString(p.text(), (float) (at[0] + BOX_PAD_X), (float) (at[1] + BOX_PAD_Y + fm.getAscent()));
            }
        }
        g2.dispose();
    }

    /** Candidate top-left corners for a w × h label box, most preferred first, in pixels. */
    private static List<double[]> spots(LabelKind kind, double ax, double ay, double w, double h, double left,
                                        double top, double right, double bottom) {
        List<double[]> out = new ArrayList<>();
        double gap = MARKER_CLEARANCE + 3;
        switch (kind) {
            case MARKER -> {
                // The four diagonals, then beside the point, then the same further out.
                for (int ring = 0; ring < 14; ring++) {
                    double d = ring * (h + 3);
                    out.add(new double[] {ax + gap, ay - gap - h - d});
                    out.add(new double[] {ax - gap - w, ay - gap - h - d});
                    out.add(new double[] {ax + gap, ay + gap + d});
                    out.add(new double[] {ax - gap - w, ay + gap + d});
                    out.add(new double[] {ax + gap + d, ay - h / 2});
                    out.add(new double[] {ax - gap - w - d, ay - h / 2});
                }
            }
            case VERTICAL -> {
                // Beside the line near the top (left first, so the line does not strike the
                // text), stepping down when a neighbour's label is already there.
                for (double yy = top + 4; yy + h < bottom; yy += h + 3) {
                    out.add(new double[] {ax - 5 - w, yy});
                    out.add(new double[] {ax + 5, yy});
                }
            }
            case BAND -> {
                // Just above the band's upper edge at the right, then inside the band, then leftwards.
                for (int k = 0; k < 12; k++) {
                    double xx = right - 6 - w - k * 0.25 * w;
                    out.add(new double[] {xx, ay - 3 - h});
                    out.add(new double[] {xx, ay + 3});
                }
            }
            case GUIDE -> {
                for (int k = 0; k < 12; k++) {
                    double xx = left + 8 + k * 0.25 * w;
                    out.add(new double[] {xx, ay - 3 - h});
                    out.add(new double[] {xx, ay + 3});
                }
            }
        }
        return out;
    }

    /** What a label names, in the order labels are placed. */
    private enum LabelKind { MARKER, VERTICAL, BAND, GUIDE }

    /** A label waiting for the chart's geometry; its anchor in data units. */
    private record PendingLabel(String text, LabelKind kind, double x, double y) {
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
