package org.flyloop.cli.plot;

import java.util.ArrayList;
import java.util.List;

/**
 * Two models of the same response on the same frequencies, for the model-agreement figure: the
 * reference, the model compared with it, optional extra traces shown but not compared, and the
 * frequency up to which the comparison is meaningful.
 *
 * @param title             headline
 * @param subtitle          second line, or empty
 * @param reference         the response compared against
 * @param model             the response compared
 * @param extras            further traces drawn on the Bode panels only
 * @param comparisonLimitHz largest frequency of the comparison, Hz (+∞: all)
 * @param verticals         vertical reference lines
 */
public record AgreementData(String title, String subtitle, BodeTrace reference, BodeTrace model,
                            List<BodeTrace> extras, double comparisonLimitHz, List<ReferenceLine> verticals) {

    public AgreementData {
        subtitle = subtitle == null ? "" : subtitle;
        extras = List.copyOf(extras);
        verticals = List.copyOf(verticals);
        double[] a = reference.frequencyHz();
        double[] b = model.frequencyHz();
        if (a.length != b.length) {
            throw new IllegalArgumentException("compared responses need the same frequencies");
        }
        for (int i = 0; i < a.length; i++) {
            if (Math.abs(a[i] - b[i]) > 1e-9 * a[i]) {
                throw new IllegalArgumentException("compared responses need the same frequencies");
            }
        }
    }

    /** Model minus reference magnitude, dB, at each frequency. */
    public double[] differenceDb() {
        double[] a = reference.magnitudeDb();
        double[] b = model.magnitudeDb();
        double[] d = new double[a.length];
        for (int i = 0; i < d.length; i++) {
            d[i] = b[i] - a[i];
        }
        return d;
    }

    /** Model minus reference phase, degrees, wrapped into (−180°, 180°]. */
    public double[] differenceDeg() {
        double[] a = reference.phaseDeg();
        double[] b = model.phaseDeg();
        double[] d = new double[a.length];
        for (int i = 0; i < d.length; i++) {
            double w = (b[i] - a[i]) % 360;
            if (w > 180) {
                w -= 360;
            } else if (w <= -180) {
                w += 360;
            }
            d[i] = w;
        }
        return d;
    }

    /** Index of the largest |value| at or below the comparison limit, or −1 if none. */
    public int worstIndex(double[] differences) {
        double[] f = reference.frequencyHz();
        int worst = -1;
        for (int i = 0; i < f.length; i++) {
            if (f[i] <= comparisonLimitHz * (1 + 1e-12) && Double.isFinite(differences[i])
                    && (worst < 0 || Math.abs(differences[i]) > Math.abs(differences[worst]))) {
                worst = i;
            }
        }
        return worst;
    }

    /** Every trace drawn on the Bode panels: reference, model, extras. */
    public List<BodeTrace> bodeTraces() {
        List<BodeTrace> all = new ArrayList<>();
        all.add(reference);
        all.add(model);
        all.addAll(extras);
        return all;
    }
}
