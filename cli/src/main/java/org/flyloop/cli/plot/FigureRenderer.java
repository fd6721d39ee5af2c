package org.flyloop.cli.plot;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Lays out a {@link Figure} and paints it on a {@link Canvas}: title, stacked panels on one
 * shared x axis, grids, traces, bands, reference lines, markers with their labels, and a legend
 * under the axes (never over the data).
 *
 * <p>Each panel is an SVG group of class {@code panel} whose data attributes give the axis ranges
 * ({@code x-min}, {@code x-max}, {@code y-min}, {@code y-max}, {@code x-scale}) and the plot
 * area in pixels ({@code left}, {@code right}, {@code top}, {@code bottom}); each marker is a
 * group of class {@code marker <kind>} carrying {@code x}, {@code y} and {@code label}. With them
 * any drawn coordinate maps back to the value it shows.
 */
public final class FigureRenderer implements Drawing {

    /** Figure width, px. */
    public static final double WIDTH = 960;
    private static final double LEFT = 88;
    private static final double RIGHT = WIDTH - 28;
    private static final double PANEL_HEIGHT = 230;
    private static final double PANEL_GAP = 16;
    private static final double LEGEND_ROW = 21;
    private static final double LEGEND_SAMPLE = 38;
    private static final double GLYPH_SPACING = 120;

    private final Figure figure;
    private final Axis x;
    private final List<Axis> ys = new ArrayList<>();
    private final List<double[]> rows = new ArrayList<>();
    private final Map<String, PlotTheme.TraceLook> looks = new LinkedHashMap<>();
    private final Map<String, Integer> lookIndex = new LinkedHashMap<>();
    private final List<double[]> legendSpots = new ArrayList<>();
    private final double height;

    public FigureRenderer(Figure figure) {
        this.figure = figure;
        assignLooks();
        double top = figure.subtitle().isEmpty() ? 44 : 62;
        double[] xRange = xDataRange();
        x = Axis.fit(figure.xScale(), xRange[0], xRange[1], figure.xUnit(), LEFT, RIGHT, 10, false);
        for (Panel p : figure.panels()) {
            double h = PANEL_HEIGHT * p.heightWeight();
            double[] yRange = yDataRange(p);
            int intervals = Math.max(2, (int) Math.floor(h / 34));
            ys.add(Axis.fit(p.scale(), yRange[0], yRange[1], p.unit(), top + h, top, intervals, true));
            rows.add(new double[] {top, top + h});
            top += h + PANEL_GAP;
        }
        double legendTop = top - PANEL_GAP + 50;
        double cx = LEFT;
        double cy = legendTop;
        for (String name : looks.keySet()) {
            double w = LEGEND_SAMPLE + 6 + TextMeasure.width(name, legendText()) + 26;
            if (cx + w > RIGHT && cx > LEFT) {
                cx = LEFT;
                cy += LEGEND_ROW;
            }
            legendSpots.add(new double[] {cx, cy});
            cx += w;
        }
        height = (looks.isEmpty() ? legendTop : cy + LEGEND_ROW) + 6;
    }

    @Override
    public String title() {
        return figure.title();
    }

    @Override
    public double width() {
        return WIDTH;
    }

    @Override
    public double height() {
        return height;
    }

    /** Paints the whole figure. */
    @Override
    public void paint(Canvas c) {
        TextStyle title = TextStyle.plain(PlotTheme.TITLE_SIZE, PlotTheme.INK).asBold();
        c.text(LEFT - 70, 26, figure.title(), title);
        if (!figure.subtitle().isEmpty()) {
            c.text(LEFT - 70, 46, figure.subtitle(), TextStyle.plain(PlotTheme.SUBTITLE_SIZE, PlotTheme.MUTED));
        }
        for (int i = 0; i < figure.panels().size(); i++) {
            paintPanel(c, i);
        }
        paintXAxisText(c);
        paintLegend(c);
    }

    private void paintPanel(Canvas c, int index) {
        Panel p = figure.panels().get(index);
        Axis y = ys.get(index);
        double top = rows.get(index)[0];
        double bottom = rows.get(index)[1];
        Map<String, String> data = new LinkedHashMap<>();
        data.put("name", p.name());
        data.put("x-scale", figure.xScale().name().toLowerCase(java.util.Locale.ROOT));
        data.put("x-min", Double.toString(x.min()));
        data.put("x-max", Double.toString(x.max()));
        data.put("y-min", Double.toString(y.min()));
        data.put("y-max", Double.toString(y.max()));
        data.put("left", SvgCanvas.num(LEFT));
        data.put("right", SvgCanvas.num(RIGHT));
        data.put("top", SvgCanvas.num(top));
        data.put("bottom", SvgCanvas.num(bottom));
        c.beginGroup("panel", data);
        for (Band b : p.bands()) {
            double y1 = clampY(y.toPixel(b.high()), top, bottom);
            double y2 = clampY(y.toPixel(b.low()), top, bottom);
            c.rect(LEFT, y1, RIGHT - LEFT, y2 - y1, null, PlotTheme.BAND_FILL);
        }
        paintGrid(c, y, top, bottom);
        for (Band b : p.bands()) {
            for (double v : new double[] {b.low(), b.high()}) {
                if (y.contains(v)) {
                    c.line(LEFT, y.toPixel(v), RIGHT, y.toPixel(v), PlotTheme.BAND_EDGE);
                }
            }
        }
        for (ReferenceLine g : p.guides()) {
            if (y.contains(g.value())) {
                c.line(LEFT, y.toPixel(g.value()), RIGHT, y.toPixel(g.value()), lineFor(g.kind()));
                if (!g.label().isEmpty()) {
                    c.text(LEFT + 6, y.toPixel(g.value()) - 4, g.label(),
                            TextStyle.plain(PlotTheme.ANNOTATION_SIZE, PlotTheme.MUTED).withHalo());
                }
            }
        }
        for (ReferenceLine v : figure.verticals()) {
            if (x.contains(v.value())) {
                c.beginGroup(v.cssClass(), Map.of("x", Double.toString(v.value()), "label", v.label()));
                c.line(x.toPixel(v.value()), top, x.toPixel(v.value()), bottom, lineFor(v.kind()));
                c.endGroup();
            }
        }
        // Ordinary traces first, so the emphasised one is drawn on top of them.
        for (Emphasis pass : new Emphasis[] {Emphasis.NORMAL, Emphasis.STRONG}) {
            for (Trace t : p.traces()) {
                if (t.emphasis() == pass) {
                    paintTrace(c, t, y, top, bottom);
                }
            }
        }
        c.rect(LEFT, top, RIGHT - LEFT, bottom - top, LineStyle.solid(1, PlotTheme.FRAME), null);
        paintYAxisText(c, p, y, top, bottom);
        LabelPlacer placer = new LabelPlacer(LEFT, top, RIGHT, bottom);
        if (index == 0) {
            paintVerticalLabels(c, top, placer);
        }
        for (Band b : p.bands()) {
            if (!b.label().isEmpty() && y.contains(b.high())) {
                TextStyle s = TextStyle.plain(PlotTheme.ANNOTATION_SIZE, PlotTheme.MUTED).anchored(TextStyle.Anchor.END)
                        .withHalo();
                c.text(RIGHT - 6, y.toPixel(b.high()) - 4, b.label(), s);
                placer.reserve(RIGHT - 6 - c.textWidth(b.label(), s), y.toPixel(b.high()) - 4 - s.size(),
                        c.textWidth(b.label(), s), s.size() + 2);
            }
        }
        paintMarkers(c, p, y, placer);
        c.endGroup();
    }

    private void paintGrid(Canvas c, Axis y, double top, double bottom) {
        LineStyle minor = LineStyle.solid(0.6, PlotTheme.GRID_MINOR);
        LineStyle major = LineStyle.solid(0.7, PlotTheme.GRID_MAJOR);
        for (double v : x.minorTicks()) {
            c.line(x.toPixel(v), top, x.toPixel(v), bottom, minor);
        }
        for (double v : x.majorTicks()) {
            c.line(x.toPixel(v), top, x.toPixel(v), bottom, major);
        }
        for (double v : y.majorTicks()) {
            c.line(LEFT, y.toPixel(v), RIGHT, y.toPixel(v), major);
        }
    }

    private void paintTrace(Canvas c, Trace t, Axis y, double top, double bottom) {
        PlotTheme.TraceLook look = looks.get(t.name());
        double[] px = new double[t.size()];
        double[] py = new double[t.size()];
        for (int i = 0; i < t.size(); i++) {
            double xv = t.xAt(i);
            boolean ok = Double.isFinite(xv) && (figure.xScale() != Scale.LOG || xv > 0) && Double.isFinite(t.yAt(i));
            px[i] = ok ? x.toPixel(xv) : Double.NaN;
            py[i] = ok ? y.toPixel(t.yAt(i)) : Double.NaN;
        }
        c.beginGroup("trace", Map.of("name", t.name()));
        List<PolylineClip.Run> runs = PolylineClip.clip(px, py, LEFT, top, RIGHT, bottom);
        for (PolylineClip.Run r : runs) {
            c.polyline(r.xs(), r.ys(), r.xs().length, look.line());
        }
        if (look.glyph() != PlotTheme.Glyph.NONE) {
            double offset = 24 + (lookIndex.get(t.name()) * 29) % GLYPH_SPACING;
            LineStyle ring = LineStyle.solid(1.1, look.line().color());
            for (PolylineClip.Run r : runs) {
                double[] xs = r.xs();
                double[] yv = r.ys();
                for (int i = 0; i + 1 < xs.length; i++) {
                    double a = Math.min(xs[i], xs[i + 1]);
                    double b = Math.max(xs[i], xs[i + 1]);
                    double k = Math.ceil((a - LEFT - offset) / GLYPH_SPACING);
                    for (double spot = LEFT + offset + k * GLYPH_SPACING; spot < b; spot += GLYPH_SPACING) {
                        if (spot >= a && b > a) {
                            double yy = yv[i] + (spot - xs[i]) / (xs[i + 1] - xs[i]) * (yv[i + 1] - yv[i]);
                            Glyphs.draw(c, look.glyph(), spot, yy, 3.4, ring, PlotTheme.PAPER);
                        }
                    }
                }
            }
        }
        c.endGroup();
    }

    private void paintMarkers(Canvas c, Panel p, Axis y, LabelPlacer placer) {
        TextStyle label = TextStyle.plain(PlotTheme.ANNOTATION_SIZE, PlotTheme.INK);
        List<Marker> ordered = new ArrayList<>();
        p.markers().stream().filter(m -> !m.labelled()).forEach(ordered::add);
        p.markers().stream().filter(Marker::labelled).forEach(ordered::add);
        for (Marker m : ordered) {
            if (!x.contains(m.x()) || !y.contains(m.y())) {
                continue;
            }
            placer.reserve(x.toPixel(m.x()) - 5, y.toPixel(m.y()) - 5, 10, 10);
        }
        for (Marker m : ordered) {
            if (!x.contains(m.x()) || !y.contains(m.y())) {
                continue;
            }
            double mx = x.toPixel(m.x());
            double my = y.toPixel(m.y());
            Map<String, String> data = new LinkedHashMap<>();
            data.put("x", Double.toString(m.x()));
            data.put("y", Double.toString(m.y()));
            data.put("label", m.label());
            c.beginGroup("marker " + m.kind().cssClass(), data);
            if (m.labelled()) {
                double w = c.textWidth(m.label(), label) + 12;
                double h = label.size() + 9;
                double[] at = placer.place(mx, my, w, h);
                double lx = Math.max(at[0], Math.min(mx, at[0] + w));
                double ly = Math.max(at[1], Math.min(my, at[1] + h));
                if (Math.hypot(lx - mx, ly - my) > 6) {
                    c.line(mx, my, lx, ly, LineStyle.solid(0.8, PlotTheme.MUTED));
                }
                c.rect(at[0], at[1], w, h, LineStyle.solid(0.8, PlotTheme.LABEL_BORDER), PlotTheme.PAPER);
                c.text(at[0] + 6, at[1] + h / 2 + TextMeasure.capHeight(label) / 2, m.label(), label);
                Glyphs.draw(c, Glyphs.forMarker(m.kind()), mx, my, 4.6, LineStyle.solid(1.3, PlotTheme.PAPER),
                        PlotTheme.INK);
            } else {
                Glyphs.draw(c, Glyphs.forMarker(m.kind()), mx, my, 3.3, LineStyle.solid(1.2, PlotTheme.INK),
                        PlotTheme.PAPER);
            }
            c.endGroup();
        }
    }

    private void paintVerticalLabels(Canvas c, double top, LabelPlacer placer) {
        TextStyle s = TextStyle.plain(PlotTheme.ANNOTATION_SIZE, PlotTheme.LIMIT).rotated(90)
                .anchored(TextStyle.Anchor.END).withHalo();
        for (ReferenceLine v : figure.verticals()) {
            if (v.label().isEmpty() || !x.contains(v.value())) {
                continue;
            }
            double px = x.toPixel(v.value()) - 4;
            c.text(px, top + 6, v.label(), s);
            placer.reserve(px - s.size(), top + 4, s.size() + 4, c.textWidth(v.label(), s) + 4);
        }
    }

    private void paintYAxisText(Canvas c, Panel p, Axis y, double top, double bottom) {
        TextStyle tick = TextStyle.plain(PlotTheme.TICK_SIZE, PlotTheme.INK).anchored(TextStyle.Anchor.END);
        LineStyle mark = LineStyle.solid(1, PlotTheme.FRAME);
        for (double v : y.majorTicks()) {
            double py = y.toPixel(v);
            c.line(LEFT - 4, py, LEFT, py, mark);
            c.text(LEFT - 7, py + TextMeasure.capHeight(tick) / 2, y.tickLabel(v), tick);
        }
        TextStyle axis = TextStyle.plain(PlotTheme.AXIS_LABEL_SIZE, PlotTheme.INK).rotated(90)
                .anchored(TextStyle.Anchor.MIDDLE);
        c.text(LEFT - 56, (top + bottom) / 2, y.title(p.quantity()), axis);
    }

    private void paintXAxisText(Canvas c) {
        double bottom = rows.get(rows.size() - 1)[1];
        TextStyle tick = TextStyle.plain(PlotTheme.TICK_SIZE, PlotTheme.INK).anchored(TextStyle.Anchor.MIDDLE);
        LineStyle mark = LineStyle.solid(1, PlotTheme.FRAME);
        for (double v : x.majorTicks()) {
            double px = x.toPixel(v);
            c.line(px, bottom, px, bottom + 4, mark);
            c.text(px, bottom + 17, x.tickLabel(v), tick);
        }
        for (double v : x.minorTicks()) {
            c.line(x.toPixel(v), bottom, x.toPixel(v), bottom + 2.5, mark);
        }
        TextStyle axis = TextStyle.plain(PlotTheme.AXIS_LABEL_SIZE, PlotTheme.INK).anchored(TextStyle.Anchor.MIDDLE);
        c.text((LEFT + RIGHT) / 2, bottom + 36, x.title(figure.xQuantity()), axis);
    }

    private void paintLegend(Canvas c) {
        if (looks.isEmpty()) {
            return;
        }
        c.beginGroup("legend", Map.of());
        int i = 0;
        for (Map.Entry<String, PlotTheme.TraceLook> e : looks.entrySet()) {
            double[] at = legendSpots.get(i++);
            double ly = at[1];
            PlotTheme.TraceLook look = e.getValue();
            c.line(at[0], ly - 4, at[0] + LEGEND_SAMPLE, ly - 4, look.line());
            if (look.glyph() != PlotTheme.Glyph.NONE) {
                Glyphs.draw(c, look.glyph(), at[0] + LEGEND_SAMPLE / 2, ly - 4, 3.4,
                        LineStyle.solid(1.1, look.line().color()), PlotTheme.PAPER);
            }
            c.text(at[0] + LEGEND_SAMPLE + 6, ly, e.getKey(), legendText());
        }
        c.endGroup();
    }

    private static TextStyle legendText() {
        return TextStyle.plain(PlotTheme.LEGEND_SIZE, PlotTheme.INK);
    }

    private void assignLooks() {
        int ordinary = 0;
        for (Panel p : figure.panels()) {
            for (Trace t : p.traces()) {
                if (looks.containsKey(t.name())) {
                    continue;
                }
                lookIndex.put(t.name(), ordinary);
                if (t.emphasis() == Emphasis.STRONG) {
                    looks.put(t.name(), PlotTheme.strong());
                } else {
                    looks.put(t.name(), PlotTheme.ordinary(ordinary++));
                }
            }
        }
    }

    private double[] xDataRange() {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Panel p : figure.panels()) {
            for (Trace t : p.traces()) {
                for (int i = 0; i < t.size(); i++) {
                    double v = t.xAt(i);
                    if (Double.isFinite(v) && (figure.xScale() != Scale.LOG || v > 0)) {
                        lo = Math.min(lo, v);
                        hi = Math.max(hi, v);
                    }
                }
            }
        }
        return new double[] {lo, hi};
    }

    private double[] yDataRange(Panel p) {
        double[] xr = xDataRange();
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Trace t : p.traces()) {
            for (int i = 0; i < t.size(); i++) {
                double v = t.yAt(i);
                if (Double.isFinite(v) && t.xAt(i) >= xr[0] && t.xAt(i) <= xr[1]) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
        }
        for (Marker m : p.markers()) {
            lo = Math.min(lo, m.y());
            hi = Math.max(hi, m.y());
        }
        for (Band b : p.bands()) {
            lo = Math.min(lo, b.low());
            hi = Math.max(hi, b.high());
        }
        double reach = Double.isFinite(hi - lo) ? 0.25 * (hi - lo) : 0;
        for (ReferenceLine g : p.guides()) {
            if (g.value() >= lo - reach && g.value() <= hi + reach) {
                lo = Math.min(lo, g.value());
                hi = Math.max(hi, g.value());
            }
        }
        if (Double.isFinite(hi - lo) && hi - lo < p.minimumSpan()) {
            double mid = (hi + lo) / 2;
            lo = mid - p.minimumSpan() / 2;
            hi = mid + p.minimumSpan() / 2;
        }
        return new double[] {lo, hi};
    }

    private static LineStyle lineFor(ReferenceLine.Kind kind) {
        return switch (kind) {
            case LIMIT -> PlotTheme.LIMIT_LINE;
            case GUIDE -> PlotTheme.GUIDE_LINE;
            case CURSOR -> PlotTheme.CURSOR_LINE;
        };
    }

    private static double clampY(double v, double top, double bottom) {
        return Math.max(top, Math.min(bottom, v));
    }
}
