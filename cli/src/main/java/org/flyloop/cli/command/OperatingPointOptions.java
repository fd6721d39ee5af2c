package org.flyloop.cli.command;

import java.util.ArrayList;
import java.util.List;
import org.flyloop.cli.spec.InputException;
import org.flyloop.cli.spec.Spec;
import org.flyloop.stage.InfeasibleOperatingPointException;
import org.flyloop.stage.OperatingPoint;
import org.flyloop.stage.OperatingPointSolver;
import org.flyloop.units.QuantityFormatException;
import org.flyloop.units.QuantityParser;
import org.flyloop.units.Unit;
import picocli.CommandLine.Option;

/**
 * Which operating points a command looks at: every corner of vin × iout from the spec, or the
 * values given with {@code --vin} and {@code --iout} (either one alone replaces that axis only).
 */
public final class OperatingPointOptions {

    @Option(names = "--vin", paramLabel = "V",
            description = "Input voltage instead of the spec's corners, e.g. 230 or 230V.")
    private String vinText;

    @Option(names = "--iout", paramLabel = "A",
            description = "Load current instead of the spec's corners, e.g. 1.5 or 1500mA.")
    private String ioutText;

    /** True when neither {@code --vin} nor {@code --iout} was given. */
    public boolean allCorners() {
        return vinText == null && ioutText == null;
    }

    /**
     * Solves the selected points, in the order vin ascending, then iout ascending.
     *
     * @throws InputException for a bad option value, or when a point cannot run (the solver's
     *                        message, prefixed with the spec's file name)
     */
    public List<OperatingPoint> solve(Spec spec) {
        List<Double> vins = vinText == null ? spec.stage().vin().corners() : List.of(positive("--vin", vinText, Unit.VOLT));
        List<Double> iouts = ioutText == null ? spec.stage().iout().corners() : List.of(positive("--iout", ioutText, Unit.AMPERE));
        OperatingPointSolver solver = new OperatingPointSolver(spec.stage(), spec.control());
        try {
            if (allCorners()) {
                return solver.corners();
            }
            List<OperatingPoint> points = new ArrayList<>();
            for (double vin : vins) {
                for (double iout : iouts) {
                    points.add(solver.solve(vin, iout));
                }
            }
            return points;
        } catch (InfeasibleOperatingPointException e) {
            throw new InputException(spec.source(), e.getMessage(), null);
        }
    }

    private static double positive(String option, String text, Unit unit) {
        double v;
        try {
            v = QuantityParser.parse(text, unit);
        } catch (QuantityFormatException e) {
            throw new InputException(option, e.problem(), e.accepted());
        }
        if (!(v > 0)) {
            throw new InputException(option, "must be positive, got " + text.strip(), unit.hint(null));
        }
        return v;
    }
}
