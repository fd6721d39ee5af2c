package org.flyloop.cli.plot;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Lays out a {@link Figure} as a title over panels stacked on one shared x axis, each panel an
 * XChart chart ({@link PanelChart}) painted into its own box of the picture; the bottom panel
 * carries the x title and the legend (under the axes, never over the data).
 *
 * <p>In the SVG each panel is a group of class {@code panel} whose data attributes give the axis
 * ranges ({@code x-min}, {@code x-max}, {@code y-min}, {@code y-max}, {@code x-scale}), the pixels
 * XChart maps the range ends to ({@code left}, {@code right}, {@code top}, {@code bottom}, in the
 * panel's own coordinates) and the axis titles; with them any drawn coordinate maps back to the
 * value it shows.
 */
public final class FigureRenderer implements Drawing {

    /** Figure width, px. */
    public static final double WIDTH = 960;
    private static final double PANEL_HEIGHT = 230;
    /** Below every plot area: x tick labels. */
    private static final double TICK_ROOM = 30;
    /** Below the bottom plot area: the x title. */
    private static final double TITLE_ROOM = 30;

    private final Figure figure;
    private final List<PanelChart> charts = new ArrayList<>();
    private final List<double[]> boxes = new ArrayList<>();
    private final double height;

    public FigureRenderer(Figure figure) {
        this.figure = figure;
        PlotTheme.ensureHeadless();
        Map<String, PlotTheme.TraceLook> looks = assignLooks(figure);
        double[] xData = xDataRange();
        AxisRange x = AxisRange.fit(figure.xScale(), xData[0], xData[1], 10, false);
        AxisUnit xUnit = AxisUnit.of(figure.xUnit(), Math.max(Math.abs(x.min()), Math.abs(x.max())),
                figure.xScale() == Scale.LINEAR);
        double top = figure.subtitle().isEmpty() ? 40 : 58;
        int last = figure.panels().size() - 1;
        for (int i = 0; i <= last; i++) {
            Panel p = figure.panels().get(i);
            double plot = PANEL_HEIGHT * p.heightWeight();
            double h = plot + TICK_ROOM + (i == last ? TITLE_ROOM : 0);
            double[] yData = yDataRange(p, x);
            AxisRange y = AxisRange.fit(p.scale(), yData[0], yData[1], Math.max(2, (int) Math.floor(plot / 34)),
                    true);
            LegendBlock legend = i == last ? new LegendBlock(looks, WIDTH) : null;
            charts.add(new PanelChart(figure, p, x, y, xUnit, looks, (int) WIDTH, (int) Math.round(h), i == last,
                    i == 0, legend));
            double box = Math.round(h + (legend == null ? 0 : legend.height()));
            boxes.add(new double[] {top, box});
            top += box;
        }
        height = top + 4;
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

    /** Paints the title with the canvas and every panel with XChart. */
    @Override
    public void paint(Canvas c) {
        double left = 14;
        c.text(left, 24, figure.title(), TextStyle.plain(PlotTheme.TITLE_SIZE, PlotTheme.INK).asBold());
        if (!figure.subtitle().isEmpty()) {
            c.text(left, 44, figure.subtitle(), TextStyle.plain(PlotTheme.SUBTITLE_SIZE, PlotTheme.MUTED));
        }
        for (int i = 0; i < charts.size(); i++) {
            PanelChart chart = charts.get(i);
            double[] box = boxes.get(i);
            c.java2d("panel", 0, box[0], WIDTH, box[1], chart::paint);
        }
    }

    /** Each trace name gets one look across all panels; the emphasised one the strong look. */
    private static Map<String, PlotTheme.TraceLook> assignLooks(Figure figure) {
        Map<String, PlotTheme.TraceLook> looks = new LinkedHashMap<>();
        int ordinary = 0;
        for (Panel p : figure.panels()) {
            for (Trace t : p.traces()) {
                if (!looks.containsKey(t.name())) {
                    looks.put(t.name(), t.emphasis() == Emphasis.STRONG ? PlotTheme.strong()
                            : PlotTheme.ordinary(ordinary++));
                }
            }
        }
        return looks;
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

    /**
     * The y span to show: every trace sample inside the x range, markers and bands, and guides
     * that lie within a quarter of that span (a far-away guide is left out rather than squashing
     * the data), widened to the panel's minimum span.
     */
    private static double[] yDataRange(Panel p, AxisRange x) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Trace t : p.traces()) {
            for (int i = 0; i < t.size(); i++) {
                double v = t.yAt(i);
                if (Double.isFinite(v) && x.contains(t.xAt(i))) {
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
}
