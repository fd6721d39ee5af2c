package org.flyloop.cli.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import javax.xml.parsers.DocumentBuilderFactory;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.flyloop.design.CornerResult;
import org.flyloop.design.DesignResult;
import org.flyloop.linear.TransferFunction;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * The data and figures of a voltage-mode report (op-amp type 3, 4 corners) checked against
 * independent computations: the closed loop recomputed pointwise from the loop-gain CSV, the
 * crossover marker against a Brent root of |T| = 1, and the model-agreement data against the
 * tolerances the averaged switch model (an independent implementation) is held to.
 */
class ReportDataTest {

    @TempDir
    static Path tmp;
    static Path dir;
    static DesignResult design;

    @BeforeAll
    static void writeReport() throws IOException {
        design = DesignScenarios.voltageMode();
        dir = ReportWriter.write(ReportInput.from(design, "telecom demo"), tmp.resolve("telecom"));
    }

    /** Columns of a CSV written by the report: header then doubles (empty cells as NaN). */
    static List<double[]> columns(Path csv, List<String> header) throws IOException {
        List<String> lines = Files.readAllLines(csv, StandardCharsets.UTF_8);
        header.addAll(Arrays.asList(lines.get(0).split(",")));
        List<double[]> cols = new ArrayList<>();
        for (int c = 0; c < header.size(); c++) {
            cols.add(new double[lines.size() - 1]);
        }
        for (int r = 1; r < lines.size(); r++) {
            String[] cells = lines.get(r).split(",", -1);
            for (int c = 0; c < cells.length; c++) {
                cols.get(c)[r - 1] = cells[c].isEmpty() ? Double.NaN : Double.parseDouble(cells[c]);
            }
        }
        return cols;
    }

    @Test
    void closedLoopCsvEqualsTOverOnePlusTComputedPointwiseFromTheLoopCsv() throws IOException {
        List<String> lh = new ArrayList<>();
        List<double[]> loop = columns(dir.resolve("data/loop-gain.csv"), lh);
        List<String> ch = new ArrayList<>();
        List<double[]> closed = columns(dir.resolve("data/closed-loop.csv"), ch);
        assertEquals("freq_hz", lh.get(0));
        assertEquals(lh, ch, "same corners, same columns");
        assertEquals(1 + 2 * design.corners().size(), lh.size());
        double worst = 0;
        for (int c = 1; c < lh.size(); c += 2) {
            for (int i = 0; i < loop.get(0).length; i++) {
                // T = |T|·e^{jφ}; T/(1 + T) by complex arithmetic, independent of the factored feedback().
                double m = Math.pow(10, loop.get(c)[i] / 20);
                double ph = Math.toRadians(loop.get(c + 1)[i]);
                double re = m * Math.cos(ph);
                double im = m * Math.sin(ph);
                double den = Math.hypot(1 + re, im);
                double db = 20 * Math.log10(Math.hypot(re, im) / den);
                worst = Math.max(worst, Math.abs(db - closed.get(c)[i]));
            }
        }
        assertTrue(worst < 0.01, "worst closed-loop disagreement " + worst + " dB");
    }

    @Test
    void loopGainCrossoverMarkerSitsOnTheBrentRootOfUnitGain() throws Exception {
        CornerResult w = DesignCurves.worst(design);
        TransferFunction t = w.loop();
        double fc = w.margins().crossoverHz();
        double root = new BrentSolver(1e-12, 1e-9).solve(200, f -> Math.log(t.magnitude(f)), fc / 3, fc * 3);
        var f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        var svg = f.newDocumentBuilder().parse(new ByteArrayInputStream(
                Files.readAllBytes(dir.resolve("loop-gain.svg"))));
        Element panel = null;
        NodeList gs = svg.getElementsByTagNameNS("*", "g");
        List<Element> marks = new ArrayList<>();
        for (int i = 0; i < gs.getLength(); i++) {
            Element g = (Element) gs.item(i);
            if (g.getAttribute("class").equals("panel") && g.getAttribute("data-name").equals("magnitude")) {
                panel = g;
            }
            if (g.getAttribute("class").equals("marker gain-crossover") && !g.getAttribute("data-label").isEmpty()
                    && panel != null) {
                marks.add(g);
            }
        }
        assertEquals(w.margins().gainCrossovers().size(), marks.size(), "every crossover of the worst corner labelled");
        Element c = (Element) marks.get(marks.size() - 1).getElementsByTagNameNS("*", "circle").item(0);
        double px = Double.parseDouble(c.getAttribute("cx"));
        double left = Double.parseDouble(panel.getAttribute("data-left"));
        double right = Double.parseDouble(panel.getAttribute("data-right"));
        double lo = Double.parseDouble(panel.getAttribute("data-x-min"));
        double hi = Double.parseDouble(panel.getAttribute("data-x-max"));
        double drawn = lo * Math.pow(hi / lo, (px - left) / (right - left));
        assertEquals(root, drawn, 0.002 * root, "drawn crossover vs Brent root");
    }

    @Test
    void averagedModelAgreesWithinTheVoltageModeCcmTolerance() throws IOException {
        // Voltage mode CCM: 0.1 dB and 0.5° up to fsw/2 (the tolerance the small-signal module holds
        // the analytic model to against the numerically linearized averaged switch model).
        List<String> h = new ArrayList<>();
        List<double[]> cols = columns(dir.resolve("data/model-agreement.csv"), h);
        double[] f = cols.get(0);
        double[] db = cols.get(h.indexOf("difference_db"));
        double[] deg = cols.get(h.indexOf("difference_deg"));
        double limit = design.request().stage().fswHz() / 2;
        double worstDb = 0;
        double worstDeg = 0;
        for (int i = 0; i < f.length; i++) {
            if (f[i] <= limit) {
                worstDb = Math.max(worstDb, Math.abs(db[i]));
                worstDeg = Math.max(worstDeg, Math.abs(deg[i]));
            }
        }
        assertTrue(worstDb < 0.1 && worstDeg < 0.5, worstDb + " dB, " + worstDeg + "°");
    }

    @Test
    void loadStepCsvStartsAtTheStepAndShowsTheLinearPeak() throws IOException {
        List<String> h = new ArrayList<>();
        List<double[]> cols = columns(dir.resolve("data/load-step.csv"), h);
        assertEquals("time_s", h.get(0));
        double[] dv = cols.get(1);
        double peak = 0;
        for (double v : dv) {
            peak = Math.abs(v) > Math.abs(peak) ? v : peak;
        }
        double expected = LoadStepCurves.linearResponse(design, 0.5 * design.request().stage().iout().max())
                .peakDeviationV();
        assertEquals(expected, peak, 1e-12);
        assertTrue(peak < 0, "more load pulls the output down");
    }
}
