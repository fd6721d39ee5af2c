package org.flyloop.cli.plot;

import java.util.ArrayList;
import java.util.List;

/**
 * A Bode figure: magnitude over phase on one logarithmic frequency axis in hertz. Every marker is
 * drawn on both panels; a labelled marker also gets a dotted drop line through both.
 */
public final class BodePlot {

    private BodePlot() {
    }

    public static Figure figure(BodeData d) {
        List<Trace> mag = new ArrayList<>();
        List<Trace> phase = new ArrayList<>();
        for (BodeTrace t : d.traces()) {
            mag.add(t.magnitudeTrace());
            phase.add(t.phaseTrace());
        }
        List<Marker> magMarks = new ArrayList<>();
        List<Marker> phaseMarks = new ArrayList<>();
        List<ReferenceLine> verticals = new ArrayList<>(d.verticals());
        for (BodeMarker m : d.markers()) {
            magMarks.add(new Marker(m.frequencyHz(), m.magnitudeDb(), m.kind(), m.label()));
            phaseMarks.add(new Marker(m.frequencyHz(), m.phaseDeg(), m.kind(), ""));
            if (!m.label().isEmpty()) {
                verticals.add(ReferenceLine.cursor(m.frequencyHz()));
            }
        }
        Panel magnitude = new Panel("magnitude", "magnitude", "dB", Scale.DECIBEL, mag, magMarks,
                d.magnitudeGuides(), List.of(), 1, 0);
        Panel phasePanel = new Panel("phase", "phase", "°", Scale.DEGREE, phase, phaseMarks, d.phaseGuides(),
                List.of(), 0.85, 0);
        return new Figure(d.title(), d.subtitle(), "frequency", "Hz", Scale.LOG, List.of(magnitude, phasePanel),
                verticals);
    }
}
