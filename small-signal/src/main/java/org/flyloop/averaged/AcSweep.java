package org.flyloop.averaged;

/**
 * A logarithmic AC sweep.
 *
 * @param pointsPerDecade points per decade
 * @param startHz         first frequency, Hz
 * @param stopHz          last frequency, Hz
 */
public record AcSweep(int pointsPerDecade, double startHz, double stopHz) {

    public AcSweep {
        if (pointsPerDecade < 1 || !(startHz > 0) || !(stopHz > startHz)) {
            throw new IllegalArgumentException("need points per decade >= 1 and 0 < start < stop");
        }
    }
}
