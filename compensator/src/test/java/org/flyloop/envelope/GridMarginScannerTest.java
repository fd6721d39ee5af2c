package org.flyloop.envelope;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flyloop.design.Corner;
import org.flyloop.design.CornerResult;
import org.flyloop.design.DesignRequest;
import org.flyloop.design.DesignResult;
import org.flyloop.design.Designer;
import org.flyloop.design.LoopEvaluation;
import org.flyloop.linear.Root;
import org.flyloop.linear.TransferFunction;
import org.flyloop.loop.LoopMargins;
import org.flyloop.spec.TolerancesSpec;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class GridMarginScannerTest {

    private static final SweepGrid GRID = SweepGrid.logarithmic(0.1, 1e6, EnvelopeSetup.DEFAULT_POINTS);
    private static final TransferFunction ONE = TransferFunction.constant(1);

    private static LoopFigures scan(TransferFunction loop) {
        double[] scratch = new double[2];
        ResponseBuffer a = new ResponseBuffer(GRID.size()).fill(loop, GRID, GRID.size() - 1, scratch);
        ResponseBuffer b = new ResponseBuffer(GRID.size()).fill(ONE, GRID, GRID.size() - 1, scratch);
        return new GridMarginScanner(GRID).scan(a, b, 1, GRID.size() - 1);
    }

    /**
     * The second-order loop L = ωn²/(s(s + 2ζωn)) (G. F. Franklin, J. D. Powell and A. Emami-Naeini,
     * Feedback Control of Dynamic Systems, §6.4, the phase margin of the standard second-order
     * loop): |L(jωc)| = 1 gives ωc = ωn·√(√(1 + 4ζ⁴) − 2ζ²) and PM = atan(2ζ/√(√(1 + 4ζ⁴) − 2ζ²)).
     */
    @ParameterizedTest
    @ValueSource(doubles = {0.1, 0.3, 0.5, 0.7, 1.0})
    void secondOrderLoopMatchesTheClosedForm(double zeta) {
        double wn = 2 * Math.PI * 1000;
        TransferFunction loop = TransferFunction.of(wn / (2 * zeta), 1, List.of(), List.of(Root.real(-2 * zeta * wn)));
        double root = Math.sqrt(Math.sqrt(1 + 4 * Math.pow(zeta, 4)) - 2 * zeta * zeta);
        LoopFigures f = scan(loop);
        assertEquals(wn * root / (2 * Math.PI), f.crossoverHz(), 1e-8 * f.crossoverHz());
        assertEquals(Math.toDegrees(Math.atan(2 * zeta / root)), f.phaseMarginDeg(), 1e-6);
        assertEquals(Double.POSITIVE_INFINITY, f.gainMarginDb());
    }

    /**
     * L = K/(s(1 + s/p1)(1 + s/p2)): the closed loop s³ + (p1 + p2)s² + p1p2·s + K·p1p2 is stable
     * for K &lt; p1 + p2 by the Routh–Hurwitz criterion (E. J. Routh, A Treatise on the Stability of
     * a Given State of Motion, 1877), so the gain margin is 20·log10((p1 + p2)/K), at the phase
     * crossover ω = √(p1·p2).
     */
    @ParameterizedTest
    @ValueSource(doubles = {100, 1000, 5000})
    void thirdOrderLoopGainMarginIsTheRouthHurwitzLimit(double k) {
        double p1 = 2 * Math.PI * 800;
        double p2 = 2 * Math.PI * 20e3;
        TransferFunction loop = TransferFunction.of(k, 1, List.of(), List.of(Root.real(-p1), Root.real(-p2)));
        LoopFigures f = scan(loop);
        assertEquals(20 * Math.log10((p1 + p2) / k), f.gainMarginDb(), 1e-7);
        assertTrue(f.hasCrossover());
    }

    @ParameterizedTest
    @ValueSource(strings = {"voltage-ccm", "current-ota", "dcm-opto", "boundary"})
    void agreesWithTheMarginAnalyzerAtEveryCorner(String scenario) {
        DesignRequest request = switch (scenario) {
            case "voltage-ccm" -> EnvelopeCases.voltageModeCcm(EnvelopeCases.opamp(0));
            case "current-ota" -> EnvelopeCases.currentMode(EnvelopeCases.ota(1e-3));
            case "dcm-opto" -> EnvelopeCases.dcm(EnvelopeCases.shuntOpto(0.5, 1.6, 8e3));
            default -> EnvelopeCases.voltageModeAcrossBoundary(EnvelopeCases.opamp(0));
        };
        DesignResult design = Designer.design(request);
        EnvelopeSetup setup = EnvelopeSetup.forWorstCase(request, design.rounded(), TolerancesSpec.none(),
                EnvelopeSetup.DEFAULT_POINTS);
        List<Corner> corners = EnvelopeCorners.resolveAll(setup.corners(), request.stage(), request.control());
        // The project's margin analyzer: adaptive grid refined at resonances, Brent refinement,
        // continuous phase: an independent route to the same three figures.
        LoopEvaluation reference = LoopEvaluation.of(design.rounded(), corners, request.control().fbGain(),
                request.stage().fswHz(), request.targets());
        LoopEngine engine = new LoopEngine(setup);
        LoopEngine.StageSide stage = engine.fillStage(engine.newStageSide(), new double[0], -1);
        LoopEngine.NetworkSide network = engine.fillNetwork(engine.newNetworkSide(), new double[0]);
        for (int c = 0; c < corners.size(); c++) {
            CornerResult r = reference.results().get(c);
            LoopMargins m = r.margins();
            LoopFigures f = engine.figures(stage, network, c);
            String where = scenario + " " + setup.corners().get(c).label();
            assertEquals(m.hasNoCrossover(), !f.hasCrossover(), where);
            if (f.hasCrossover()) {
                assertEquals(m.crossoverHz(), f.crossoverHz(), 1e-7 * m.crossoverHz(), where);
                assertEquals(m.phaseMarginDeg(), f.phaseMarginDeg(), 1e-4, where);
            }
            if (Double.isFinite(m.gainMarginDb())) {
                assertEquals(m.gainMarginDb(), f.gainMarginDb(), 1e-4, where);
            } else {
                assertFalse(Double.isFinite(f.gainMarginDb()), where);
            }
        }
    }

    @ParameterizedTest
    @ValueSource(doubles = {1e-12, 1e12})
    void aLoopThatNeverCrossesHasNoCrossoverAndRanksWorst(double k) {
        // a constant far below or above unity over the whole band
        LoopFigures f = scan(TransferFunction.of(k, 0, List.of(), List.of(Root.real(-1e9))));
        assertFalse(f.hasCrossover());
        assertEquals(Double.NEGATIVE_INFINITY, f.rankedPhaseMarginDeg());
        assertEquals(Double.NEGATIVE_INFINITY, EnvelopeFigure.LOWEST_CROSSOVER.badness(f));
    }
}
