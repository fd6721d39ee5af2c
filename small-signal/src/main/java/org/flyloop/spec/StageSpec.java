package org.flyloop.spec;

/**
 * The flyback power stage as written in the spec, in SI units.
 *
 * @param vin             DC input voltage at the primary (bulk capacitor), V
 * @param vout            regulated output voltage, V
 * @param iout            load current range, A
 * @param fswHz           switching frequency, Hz
 * @param lm              primary magnetizing inductance, H
 * @param turns           turns ratio Np/Ns
 * @param cout            output capacitance, F
 * @param esr             output capacitor equivalent series resistance, Ω (0 allowed)
 * @param rectifierDrop   output rectifier forward drop, V (0 allowed)
 * @param switchResistance primary switch on-resistance, Ω (0 allowed)
 */
public record StageSpec(ValueRange vin, double vout, ValueRange iout, double fswHz, double lm,
                        double turns, double cout, double esr, double rectifierDrop,
                        double switchResistance) {

    public StageSpec {
        requirePositive("vout", vout);
        requirePositive("fsw", fswHz);
        requirePositive("lm", lm);
        requirePositive("turns", turns);
        requirePositive("cout", cout);
        requireNonNegative("esr", esr);
        requireNonNegative("rectifier_drop", rectifierDrop);
        requireNonNegative("switch_resistance", switchResistance);
        if (!(vin.min() > 0)) {
            throw new IllegalArgumentException("stage.vin must be positive");
        }
        if (!(iout.min() > 0)) {
            throw new IllegalArgumentException("stage.iout must be positive");
        }
    }

    private static void requirePositive(String key, double v) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException("stage." + key + " must be positive, got " + v);
        }
    }

    private static void requireNonNegative(String key, double v) {
        if (!(v >= 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException("stage." + key + " must be zero or positive, got " + v);
        }
    }

    /** Switching period Ts = 1/fsw, s. */
    public double periodS() {
        return 1 / fswHz;
    }

    /** Magnetizing inductance referred to the secondary, Ls = Lm/N², H. */
    public double secondaryInductance() {
        return lm / (turns * turns);
    }

    /** Returns a copy with another magnetizing inductance (for tolerance and recheck analyses). */
    public StageSpec withLm(double newLm) {
        return new StageSpec(vin, vout, iout, fswHz, newLm, turns, cout, esr, rectifierDrop, switchResistance);
    }

    /** Returns a copy with another output capacitance. */
    public StageSpec withCout(double newCout) {
        return new StageSpec(vin, vout, iout, fswHz, lm, turns, newCout, esr, rectifierDrop, switchResistance);
    }

    /** Returns a copy with another ESR. */
    public StageSpec withEsr(double newEsr) {
        return new StageSpec(vin, vout, iout, fswHz, lm, turns, cout, newEsr, rectifierDrop, switchResistance);
    }

    /** Returns a copy with another switching frequency. */
    public StageSpec withFsw(double newFswHz) {
        return new StageSpec(vin, vout, iout, newFswHz, lm, turns, cout, esr, rectifierDrop, switchResistance);
    }
}
