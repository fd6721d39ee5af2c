package org.flyloop.linear;

/**
 * One non-zero root of a transfer function in factored form: a real root, or a complex-conjugate
 * pair stored by its upper member.
 *
 * <p>A real root {@code r} contributes the factor {@code (1 − s/r)}; a pair {@code r, r̄} contributes
 * {@code (1 − s/r)(1 − s/r̄) = 1 + s/(ω0·Q) + s²/ω0²}, with {@code ω0 = |r|} and
 * {@code Q = −|r| / (2·Re r)}. Both factors equal 1 at s = 0, so the gain of a
 * {@link TransferFunction} is its low-frequency gain. A negative Q is a pair in the right half-plane
 * (for zeros: a non-minimum-phase pair); an infinite Q a pair on the jω axis.
 *
 * @param re real part in rad/s
 * @param im imaginary part in rad/s, zero for a real root, positive for a pair
 */
public record Root(double re, double im) {

    public Root {
        if (!Double.isFinite(re) || !Double.isFinite(im)) {
            throw new IllegalArgumentException("root must be finite: " + re + " + j" + im);
        }
        if (im < 0) {
            throw new IllegalArgumentException("store the upper member of a pair (im >= 0): " + im);
        }
        if (re == 0 && im == 0) {
            throw new IllegalArgumentException("roots at the origin are counted as integrators, not stored");
        }
    }

    /** A real root at {@code re} rad/s (negative: left half-plane). */
    public static Root real(double re) {
        return new Root(re, 0);
    }

    /** A left-half-plane real root with corner frequency {@code fHz}: s = −2π·f. */
    public static Root realAtHz(double fHz) {
        return new Root(-2 * Math.PI * fHz, 0);
    }

    /** A right-half-plane real root with corner frequency {@code fHz}: s = +2π·f. */
    public static Root rightHalfPlaneAtHz(double fHz) {
        return new Root(2 * Math.PI * fHz, 0);
    }

    /**
     * A complex pair from its natural frequency and quality factor: Re = −ω0/(2Q), |r| = ω0.
     * Requires |Q| &gt; 0.5 (otherwise the roots are real; use two real roots).
     */
    public static Root pair(double omega0, double q) {
        if (!(Math.abs(q) > 0.5)) {
            throw new IllegalArgumentException("a complex pair needs |Q| > 0.5, got " + q);
        }
        double re = Double.isInfinite(q) ? 0.0 : -omega0 / (2 * q);
        double im = Math.sqrt(omega0 * omega0 - re * re);
        return new Root(re, im);
    }

    /** A complex pair from natural frequency in hertz and Q. */
    public static Root pairAtHz(double f0Hz, double q) {
        return pair(2 * Math.PI * f0Hz, q);
    }

    /** True when this is a conjugate pair (two roots). */
    public boolean isPair() {
        return im > 0;
    }

    /** Number of roots this entry stands for: 1 or 2. */
    public int order() {
        return isPair() ? 2 : 1;
    }

    /** |r| in rad/s: the corner (real) or natural (pair) frequency. */
    public double omega0() {
        return Math.hypot(re, im);
    }

    /** |r|/(2π) in hertz. */
    public double frequencyHz() {
        return omega0() / (2 * Math.PI);
    }

    /**
     * Quality factor −|r|/(2·Re r); for a real root this is ±0.5 by the same formula.
     * Infinite for a root on the jω axis.
     */
    public double q() {
        return re == 0 ? Double.POSITIVE_INFINITY : -omega0() / (2 * re);
    }

    /** True when the root lies strictly in the right half-plane. */
    public boolean isRightHalfPlane() {
        return re > 0;
    }

    /** Relative distance |a − b| / max(|a|, |b|) between two roots. */
    public double relativeDistance(Root other) {
        double d = Math.hypot(re - other.re, im - other.im);
        return d / Math.max(omega0(), other.omega0());
    }
}
