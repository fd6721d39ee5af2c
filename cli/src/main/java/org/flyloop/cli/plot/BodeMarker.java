package org.flyloop.cli.plot;

/**
 * A marked frequency on a Bode figure, shown on both panels; the label goes on the magnitude panel.
 *
 * @param frequencyHz where, Hz
 * @param magnitudeDb magnitude there, dB
 * @param phaseDeg    phase there, degrees (on the trace's continuous phase)
 * @param kind        what it stands for
 * @param label       e.g. "fc = 2.1 kHz, PM = 52°"; empty for an unlabelled marker
 */
public record BodeMarker(double frequencyHz, double magnitudeDb, double phaseDeg, MarkerKind kind, String label) {

    public BodeMarker {
        label = label == null ? "" : label;
    }
}
