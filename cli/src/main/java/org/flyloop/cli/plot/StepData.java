package org.flyloop.cli.plot;

import java.util.ArrayList;
import java.util.List;

/**
 * Everything a step or transient figure shows, as plain data. Series are overlaid; any number of
 * models can join ({@link #withSeries}).
 *
 * @param title     headline
 * @param subtitle  second line, or empty
 * @param quantity  what the y axis shows, e.g. "output deviation"
 * @param unit      its SI unit, e.g. "V" (the axis picks the prefix)
 * @param series    time series, x in seconds
 * @param markers   peak and settling points
 * @param bands     settling band(s)
 * @param verticals vertical lines (e.g. settling time), x in seconds
 */
public record StepData(String title, String subtitle, String quantity, String unit, List<Trace> series,
                       List<Marker> markers, List<Band> bands, List<ReferenceLine> verticals) {

    public StepData {
        subtitle = subtitle == null ? "" : subtitle;
        series = List.copyOf(series);
        markers = List.copyOf(markers);
        bands = List.copyOf(bands);
        verticals = List.copyOf(verticals);
    }

    /** Series only. */
    public static StepData of(String title, String subtitle, String quantity, String unit, List<Trace> series) {
        return new StepData(title, subtitle, quantity, unit, series, List.of(), List.of(), List.of());
    }

    /** A copy with one more series overlaid. */
    public StepData withSeries(Trace more) {
        List<Trace> s = new ArrayList<>(series);
        s.add(more);
        return new StepData(title, subtitle, quantity, unit, s, markers, bands, verticals);
    }

    /** A copy with one more marker. */
    public StepData withMarker(Marker more) {
        List<Marker> m = new ArrayList<>(markers);
        m.add(more);
        return new StepData(title, subtitle, quantity, unit, series, m, bands, verticals);
    }

    /** A copy with one more band. */
    public StepData withBand(Band more) {
        List<Band> b = new ArrayList<>(bands);
        b.add(more);
        return new StepData(title, subtitle, quantity, unit, series, markers, b, verticals);
    }

    /** A copy with one more vertical line. */
    public StepData withVertical(ReferenceLine more) {
        List<ReferenceLine> v = new ArrayList<>(verticals);
        v.add(more);
        return new StepData(title, subtitle, quantity, unit, series, markers, bands, v);
    }
}
