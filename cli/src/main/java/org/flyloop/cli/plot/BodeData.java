package org.flyloop.cli.plot;

import java.util.ArrayList;
import java.util.List;

/**
 * Everything a Bode figure shows, as plain data.
 *
 * @param title            headline
 * @param subtitle         second line, or empty
 * @param traces           responses (all corners; one may be {@link Emphasis#STRONG})
 * @param markers          crossovers and other marked frequencies
 * @param verticals        vertical reference lines (limits)
 * @param magnitudeGuides  horizontal guides on the magnitude panel, dB (e.g. 0 dB)
 * @param phaseGuides      horizontal guides on the phase panel, degrees (e.g. −180°)
 */
public record BodeData(String title, String subtitle, List<BodeTrace> traces, List<BodeMarker> markers,
                       List<ReferenceLine> verticals, List<ReferenceLine> magnitudeGuides,
                       List<ReferenceLine> phaseGuides) {

    public BodeData {
        subtitle = subtitle == null ? "" : subtitle;
        traces = List.copyOf(traces);
        markers = List.copyOf(markers);
        verticals = List.copyOf(verticals);
        magnitudeGuides = List.copyOf(magnitudeGuides);
        phaseGuides = List.copyOf(phaseGuides);
    }

    /** Traces only. */
    public static BodeData of(String title, String subtitle, List<BodeTrace> traces) {
        return new BodeData(title, subtitle, traces, List.of(), List.of(), List.of(), List.of());
    }

    /** A copy with one more trace (another model or corner joins the overlay). */
    public BodeData withTrace(BodeTrace trace) {
        List<BodeTrace> t = new ArrayList<>(traces);
        t.add(trace);
        return new BodeData(title, subtitle, t, markers, verticals, magnitudeGuides, phaseGuides);
    }

    /** A copy with these markers added. */
    public BodeData withMarkers(List<BodeMarker> more) {
        List<BodeMarker> m = new ArrayList<>(markers);
        m.addAll(more);
        return new BodeData(title, subtitle, traces, m, verticals, magnitudeGuides, phaseGuides);
    }

    /** A copy with these vertical reference lines added. */
    public BodeData withVerticals(List<ReferenceLine> more) {
        List<ReferenceLine> v = new ArrayList<>(verticals);
        v.addAll(more);
        return new BodeData(title, subtitle, traces, markers, v, magnitudeGuides, phaseGuides);
    }

    /** A copy with these guides added. */
    public BodeData withGuides(List<ReferenceLine> magnitude, List<ReferenceLine> phase) {
        List<ReferenceLine> m = new ArrayList<>(magnitudeGuides);
        m.addAll(magnitude);
        List<ReferenceLine> p = new ArrayList<>(phaseGuides);
        p.addAll(phase);
        return new BodeData(title, subtitle, traces, markers, verticals, m, p);
    }
}
