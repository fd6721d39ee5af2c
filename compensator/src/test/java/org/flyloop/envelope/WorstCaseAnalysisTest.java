package org.flyloop.envelope;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.flyloop.design.Corner;
import org.flyloop.design.DesignRequest;
import org.flyloop.design.Designer;
import org.flyloop.design.LoopEvaluation;
import org.flyloop.linear.TransferFunction;
import org.flyloop.loop.LoopGain;
import org.flyloop.loop.LoopMargins;
import org.flyloop.loop.MarginAnalyzer;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.Tolerance;
import org.flyloop.spec.TolerancesSpec;
import org.flyloop.stage.OperatingPointSolver;
import org.flyloop.stage.model.AnalyticStageModel;
import org.flyloop.stage.model.StageTransferFunctions;
import org.junit.jupiter.api.Test;

class WorstCaseAnalysisTest {

    /** Margins at every corner for box point {@code u}, from freshly built loops and the margin analyzer. */
    private static List<LoopMargins> analyzed(EnvelopeSetup setup, double[] u) {
        DesignRequest r = setup.request();
        StageSpec stage = setup.box().stageAt(r.stage(), u);
        CompensatorNetwork n = setup.network().withParts(setup.box().partsAt(setup.network(), u));
        List<Corner> corners = EnvelopeCorners.resolveAll(setup.corners(), stage, r.control());
        LoopEvaluation e = LoopEvaluation.of(n, corners, r.control().fbGain(), stage.fswHz(), r.targets());
        return e.results().stream().map(x -> x.margins()).toList();
    }

    private static double[] pointOf(EnvelopeSetup setup, Map<String, Double> deviations) {
        double[] u = new double[setup.box().size()];
        for (int j = 0; j < u.length; j++) {
            ToleranceParameter p = setup.box().parameters().get(j);
            u[j] = (deviations.get(p.name()) - p.band().low()) / (p.band().high() - p.band().low());
        }
        return u;
    }

    @Test
    void vertexEnumerationFindsTheExtremesOfABruteForceSweep() {
        DesignRequest r = EnvelopeCases.voltageModeCcm(EnvelopeCases.opamp(0));
        CompensatorNetwork n = Designer.design(r).rounded();
        TolerancesSpec t = new TolerancesSpec(Tolerance.symmetric(0.2), Tolerance.symmetric(0.2), Tolerance.NONE,
                Tolerance.NONE, false, Tolerance.NONE, Tolerance.symmetric(0.1));
        EnvelopeSetup setup = EnvelopeSetup.forWorstCase(r, n, t, EnvelopeSetup.DEFAULT_POINTS);
        int k = setup.box().size();
        assertEquals(5, k, setup.box().parameters().toString());
        // brute force: every vertex and the centre, every corner, analysed from scratch
        double pm = Double.POSITIVE_INFINITY;
        double gm = Double.POSITIVE_INFINITY;
        double fLow = Double.POSITIVE_INFINITY;
        double fHigh = 0;
        List<double[]> points = new ArrayList<>();
        for (int v = 0; v < 1 << k; v++) {
            double[] u = new double[k];
            for (int j = 0; j < k; j++) {
                u[j] = (v >> j) & 1;
            }
            points.add(u);
        }
        double[] centre = new double[k];
        Arrays.fill(centre, 0.5);
        points.add(centre);
        for (double[] u : points) {
            for (LoopMargins m : analyzed(setup, u)) {
                pm = Math.min(pm, m.phaseMarginDeg());
                gm = Math.min(gm, Math.abs(m.gainMarginDb()));
                fLow = Math.min(fLow, m.crossoverHz());
                fHigh = Math.max(fHigh, m.crossoverHz());
            }
        }
        WorstCase vertices = WorstCaseAnalysis.run(setup, false);
        assertEquals(pm, vertices.phaseMargin().value(), 1e-4);
        assertEquals(gm, Math.abs(vertices.gainMargin().value()), 1e-4);
        assertEquals(fLow, vertices.lowestCrossover().value(), 1e-7 * fLow);
        assertEquals(fHigh, vertices.highestCrossover().value(), 1e-7 * fHigh);
        // the search inside the box can only make each figure worse
        WorstCase refined = WorstCaseAnalysis.run(setup);
        assertTrue(refined.phaseMargin().value() <= pm + 1e-9);
        assertTrue(Math.abs(refined.gainMargin().value()) <= gm + 1e-9);
        assertTrue(refined.lowestCrossover().value() <= fLow * (1 + 1e-12));
        assertTrue(refined.highestCrossover().value() >= fHigh * (1 - 1e-12));
    }

    @Test
    void eachReportedWorstReproducesFromItsCornerAndDeviations() {
        DesignRequest r = EnvelopeCases.voltageModeCcm(EnvelopeCases.opamp(0));
        EnvelopeSetup setup = EnvelopeSetup.forWorstCase(r, Designer.design(r).rounded(), EnvelopeCases.full(),
                EnvelopeSetup.DEFAULT_POINTS);
        WorstCase w = WorstCaseAnalysis.run(setup);
        for (EnvelopeFigure figure : EnvelopeFigure.values()) {
            WorstFigure f = w.of(figure);
            int c = setup.corners().indexOf(f.corner());
            LoopMargins m = analyzed(setup, pointOf(setup, f.deviations())).get(c);
            double expected = switch (figure) {
                case PHASE_MARGIN -> m.phaseMarginDeg();
                case GAIN_MARGIN -> m.gainMarginDb();
                default -> m.crossoverHz();
            };
            assertEquals(expected, f.value(), 1e-4 * Math.max(1, Math.abs(expected)), figure.label());
        }
    }

    @Test
    void theVertexSearchForLargeBoxesAgreesWithEnumeration() {
        DesignRequest r = EnvelopeCases.voltageModeCcm(EnvelopeCases.opamp(0));
        EnvelopeSetup setup = EnvelopeSetup.forWorstCase(r, Designer.design(r).rounded(), EnvelopeCases.full(),
                EnvelopeSetup.DEFAULT_POINTS);
        WorstCase enumerated = WorstCaseAnalysis.run(setup);
        WorstCase searched = WorstCaseAnalysis.run(setup, true, 4);
        assertTrue(searched.method().startsWith("sensitivity vertex"), searched.method());
        assertEquals(enumerated.phaseMargin().corner(), searched.phaseMargin().corner());
        assertEquals(enumerated.phaseMargin().value(), searched.phaseMargin().value(), 0.5);
        assertEquals(enumerated.gainMargin().value(), searched.gainMargin().value(), 0.5);
    }

    /**
     * Voltage mode in CCM is at its worst at low line and full load, where the RHP zero
     * D′²·R/(2π·D·Ls) is lowest (common practice, no source). Checked for the designer's network
     * and for one tuned at the nominal point only, against a dense sweep of vin × iout analysed
     * from scratch.
     */
    @Test
    void voltageModeCcmIsWorstAtLowLineFullLoad() {
        DesignRequest r = EnvelopeCases.wideLine();
        for (CompensatorNetwork n : List.of(Designer.design(r).rounded(), EnvelopeCases.tunedAtNominal())) {
            EnvelopeCheck check = EnvelopeCheck.run(r, n, TolerancesSpec.none());
            int worst = check.envelope().indexOf(check.envelope().stream().filter(c -> c.vinV() == 18
                    && c.nominalIoutA() == 4).findFirst().orElseThrow());
            double cornerPm = check.nominal().results().get(worst).margins().phaseMarginDeg();
            assertEquals(check.nominal().worstPhaseMargin(), check.nominal().results().get(worst));
            for (Corner c : check.corners()) {
                assertTrue(c.stage().rhpZeroHz() >= check.corners().get(worst).stage().rhpZeroHz());
            }
            OperatingPointSolver solver = new OperatingPointSolver(r.stage(), r.control());
            TransferFunction gc = n.transferFunction();
            double densest = Double.POSITIVE_INFINITY;
            for (int i = 0; i <= 12; i++) {
                for (int j = 0; j <= 12; j++) {
                    double vin = 18 + (75 - 18) * i / 12.0;
                    double iout = 2 + 2 * j / 12.0;
                    StageTransferFunctions g = AnalyticStageModel.at(r.stage(), r.control(), solver.solve(vin, iout));
                    TransferFunction t = new LoopGain(gc, r.control().fbGain(), g.control()).transferFunction();
                    double pm = MarginAnalyzer.analyze(t, LoopEvaluation.LOWEST_HZ, r.stage().fswHz() / 2)
                            .phaseMarginDeg();
                    assertTrue(pm >= cornerPm - 1e-6, "vin=" + vin + " iout=" + iout + ": " + pm + " < " + cornerPm);
                    densest = Math.min(densest, pm);
                }
            }
            assertEquals(cornerPm, densest, 1e-9);
        }
    }

    @Test
    void theNominalTunedLoopMissesOnlyWhereTheRhpZeroIsLow() {
        EnvelopeCheck check = EnvelopeCheck.run(EnvelopeCases.wideLine(), EnvelopeCases.tunedAtNominal(),
                TolerancesSpec.none());
        int nominal = 0;
        for (int c = 0; c < check.envelope().size(); c++) {
            if (check.envelope().get(c).vinV() == 48 && check.envelope().get(c).nominalIoutA() == 3) {
                nominal = c;
            }
        }
        assertTrue(check.nominal().results().get(nominal).meetsTargets());
        assertTrue(!check.meetsTargets());
        assertTrue(check.misses().stream().anyMatch(m -> m.startsWith("at vin=18 V, iout=4 A: closed loop unstable")),
                check.misses().toString());
    }
}
