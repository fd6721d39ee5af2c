package org.flyloop.cli.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.flyloop.cli.plot.AgreementPlot;
import org.flyloop.cli.plot.BodePlot;
import org.flyloop.cli.plot.FigureRenderer;
import org.flyloop.cli.plot.SiText;
import org.flyloop.cli.plot.StepPlot;
import org.flyloop.design.CornerResult;
import org.flyloop.design.CrossoverLimit;
import org.flyloop.design.DesignResult;
import org.flyloop.design.Placement;
import org.flyloop.loop.LoadStepResponse;
import org.flyloop.loop.LoopMargins;
import org.flyloop.loop.PhaseCrossover;
import org.flyloop.spec.ControlScheme;
import org.flyloop.stage.OperatingPoint;
import org.flyloop.stage.model.PoleZero;
import org.flyloop.stage.model.StageTransferFunctions;

/**
 * The content of a design report, section by section, in the order a reviewer reads it: verdict,
 * spec, operating points, stage, compensator, parts, margins and responses, envelope, warnings,
 * rules of thumb, safety, and the note on the averaged model. Formatting only.
 */
public final class ReportOutline {

    private ReportOutline() {
    }

    public static ReportDocument build(ReportInput in) {
        DesignResult r = in.design();
        List<Section> s = new ArrayList<>();
        s.add(verdict(r));
        s.add(new Section("spec", "Specification as understood", List.of(
                new Block.Table("Every value in SI units, as read from the spec",
                        List.of("section", "quantity", "value"),
                        SpecRows.of(r.request(), r.placement().type(), r.placement().crossoverHz())))));
        s.add(operatingPoints(r));
        s.add(stage(in));
        s.add(compensator(in));
        s.add(parts(r));
        s.add(margins(in));
        s.add(EnvelopeSection.of(in.envelope(), in.monteCarlo()));
        List<String> warnings = new ArrayList<>(r.warnings());
        warnings.addAll(in.notes());
        s.add(new Section("warnings", "Warnings", warnings.isEmpty()
                ? List.of(new Block.Paragraph("No warnings.", Block.Tone.PASS))
                : List.of(new Block.Bullets(warnings))));
        s.add(rulesOfThumb(in));
        s.add(new Section("safety", "Safety", List.of(new Block.Paragraph(SAFETY, Block.Tone.CAUTION))));
        s.add(new Section("averaged-model", "About the averaged model",
                List.of(new Block.Paragraph(AVERAGED_NOTE, Block.Tone.PLAIN))));
        return new ReportDocument("flyloop design report: " + in.specName(), s);
    }

    static final String SAFETY = "Offline flybacks carry lethal voltages on the primary side and on the bulk "
            + "capacitor long after the input is removed. Keep the isolation barrier intact, with the creepage and "
            + "clearance it needs, including across the optocoupler. These are calculated results: verify the loop "
            + "on the bench with a frequency-response analyzer, injecting across a small resistor in the feedback "
            + "path with the measurement isolated, before trusting the margins. Follow the applicable safety "
            + "standards, local codes and licensed practice for the equipment and for the people working on it.";

    static final String AVERAGED_NOTE = "The averaged switch model has no sampling effect. In peak current mode "
            + "the real current loop samples once per switching period, which adds a double pole at half the "
            + "switching frequency (Ridley's sampling pair, R. B. Ridley, \"A new, continuous-time model for "
            + "current-mode control\", IEEE Trans. Power Electronics 6(2), 1991); the averaged model does not show "
            + "it. The analytic model includes it, so above about a tenth of the switching frequency trust the "
            + "analytic curves and the bench rather than the averaged model. In voltage mode both models describe "
            + "the same averaged converter; neither covers behaviour near and above fsw/2.";

    private static Section verdict(DesignResult r) {
        List<Block> b = new ArrayList<>();
        int n = r.roundedLoop().results().size();
        long missed = r.roundedLoop().results().stream().filter(c -> !c.meetsTargets()).count();
        b.add(r.targetsMet()
                ? new Block.Paragraph("Targets met at every corner (" + n + " corners, standard part values).",
                        Block.Tone.PASS)
                : new Block.Paragraph("Targets missed at " + missed + " of " + n + " corners (standard part values).",
                        Block.Tone.FAIL));
        CornerResult pm = r.roundedLoop().worstPhaseMargin();
        CornerResult gm = r.roundedLoop().worstGainMargin();
        List<String> items = new ArrayList<>();
        items.add("Worst corner: " + CornerNames.corner(pm.corner()) + ", phase margin "
                + degrees(pm.margins().phaseMarginDeg()) + " at fc = " + hz(pm.margins().crossoverHz())
                + " (target " + degrees(r.request().targets().phaseMarginDeg()) + ").");
        PhaseCrossover g = gm.margins().worstGain();
        items.add("Smallest gain margin: " + (g == null ? "none (no phase crossover below fsw/2)"
                : decibels(g.gainMarginDb()) + " at " + hz(g.frequencyHz()) + ", " + CornerNames.corner(gm.corner()))
                + " (target " + decibels(r.request().targets().gainMarginDb()) + ").");
        long unstable = r.roundedLoop().results().stream().filter(c -> !c.margins().isStable()).count();
        items.add(unstable == 0 ? "Closed loop stable at every corner (Nyquist criterion)."
                : "Closed loop not stable at " + unstable + " corner(s) (Nyquist criterion).");
        items.add("Compensator: " + r.rounded().kind().specName() + ", type " + r.placement().type()
                + ", placed by " + r.placement().method() + " for a crossover of " + hz(r.placement().crossoverHz())
                + ".");
        for (CornerResult c : r.roundedLoop().results()) {
            for (String miss : c.misses()) {
                items.add("Missed at " + CornerNames.corner(c.corner()) + ": " + miss + ".");
            }
        }
        b.add(new Block.Bullets(items));
        return new Section("verdict", "Verdict", b);
    }

    private static Section operatingPoints(DesignResult r) {
        List<List<String>> rows = new ArrayList<>();
        for (OperatingPoint p : distinctPoints(r).keySet()) {
            rows.add(List.of(CornerNames.point(p), p.mode().label(), SiText.plain(p.duty(), 3),
                    SiText.plain(p.duty2(), 3), SiText.format(p.ipk(), "A", 3), SiText.format(p.ivalley(), "A", 3),
                    SiText.format(p.isecPk(), "A", 3), SiText.format(p.iswRms(), "A", 3),
                    SiText.format(p.irectRms(), "A", 3), SiText.format(p.vswMax(), "V", 3),
                    SiText.format(p.ioutBoundary(), "A", 3)));
        }
        return new Section("operating-points", "Operating points", List.of(new Block.Table(
                "Steady state at each corner; currents on the primary unless marked secondary",
                List.of("corner (Vin / Iout)", "mode", "D", "D2", "Ipk", "Ivalley", "Isec,pk", "Isw,rms", "Irect,rms",
                        "Vsw,max", "CCM/DCM boundary load"), rows)));
    }

    private static Section stage(ReportInput in) {
        DesignResult r = in.design();
        List<List<String>> rows = new ArrayList<>();
        for (Map.Entry<OperatingPoint, StageTransferFunctions> e : distinctPoints(r).entrySet()) {
            for (PoleZero pz : e.getValue().features()) {
                rows.add(List.of(CornerNames.point(e.getKey()), pz.kind().name().toLowerCase(java.util.Locale.ROOT),
                        pz.label(), hz(pz.frequencyHz()), pz.order() == 2 ? SiText.plain(pz.q(), 3) : "–",
                        pz.rightHalfPlane() ? "right" : "left"));
            }
        }
        List<Block> b = new ArrayList<>();
        b.add(new Block.Table("Poles and zeros of the control-to-output response v̂o/v̂c",
                List.of("corner (Vin / Iout)", "kind", "what", "frequency", "Q", "half-plane"), rows));
        StageTransferFunctions first = distinctPoints(r).values().iterator().next();
        if (!Double.isNaN(first.qp()) || r.request().control().scheme() == ControlScheme.CURRENT) {
            List<String> qp = new ArrayList<>();
            distinctPoints(r).forEach((p, st) -> qp.add(CornerNames.point(p) + ": sampling Qp = "
                    + SiText.plain(st.qp(), 3) + "; slope for Qp = 1: " + SiText.format(st.slopeForUnityQpVPerS(),
                    "V/s", 3)));
            b.add(new Block.Bullets(qp));
        }
        b.add(picture("stage-bode", "Power stage control to output at each operating point; the worst corner's "
                + "point in bold.", BodePlot.figure(in.curves().stage())));
        if (in.curves().agreement() != null) {
            b.add(picture("model-agreement", "Analytic model against the averaged switch model linearized "
                    + "numerically at the worst corner, and their difference.",
                    AgreementPlot.figure(in.curves().agreement())));
        }
        return new Section("stage", "Stage poles and zeros", b);
    }

    private static Section compensator(ReportInput in) {
        DesignResult r = in.design();
        Placement p = r.placement();
        List<Block> b = new ArrayList<>();
        b.add(new Block.Picture("compensator-schematic", "The compensator with standard part values.",
                new CompensatorSchematic(r.rounded(), r.request().feedback().referenceV(),
                        r.request().feedback().pullupSupplyV())));
        b.add(new Block.Table("Placement", List.of("quantity", "value"), List.of(
                List.of("method", p.method()),
                List.of("type", Integer.toString(p.type())),
                List.of("crossover designed for", hz(p.crossoverHz())),
                List.of("phase boost asked at crossover", degrees(p.boostDeg())),
                List.of("zeros", frequencies(p.zerosHz())),
                List.of("poles (besides the integrator)", frequencies(p.polesHz())))));
        List<List<String>> limits = new ArrayList<>();
        for (CrossoverLimit l : r.limits()) {
            limits.add(List.of(l.name(), hz(l.frequencyHz()), l.basis()));
        }
        b.add(new Block.Table("Upper bounds on the crossover", List.of("bound", "frequency", "basis"), limits));
        b.add(picture("compensator-bode", "Compensator with standard and with exact part values.",
                BodePlot.figure(in.curves().compensator())));
        return new Section("compensator", "Compensator", b);
    }

    private static Section parts(DesignResult r) {
        Map<String, Double> ideal = r.ideal().parts();
        Map<String, Double> std = r.rounded().parts();
        List<List<String>> rows = new ArrayList<>();
        String rs = r.request().series().resistors();
        String cs = r.request().series().capacitors();
        for (Map.Entry<String, Double> e : std.entrySet()) {
            String name = e.getKey();
            Double exact = ideal.get(name);
            String change = exact == null || exact == 0 || !Double.isFinite(exact) ? "–"
                    : (e.getValue() >= exact ? "+" : "") + SiText.fixed(100 * (e.getValue() / exact - 1), 1) + " %";
            rows.add(List.of(name, PartText.role(name, rs, cs), exact == null ? "–" : PartText.value(name, exact),
                    PartText.value(name, e.getValue()), change));
        }
        double pmIdeal = r.idealLoop().worstPhaseMargin().margins().phaseMarginDeg();
        double pmStd = r.roundedLoop().worstPhaseMargin().margins().phaseMarginDeg();
        return new Section("parts", "Parts: exact versus standard values", List.of(
                new Block.Table("Exact values from the placement and the standard values chosen",
                        List.of("part", "what", "exact", "standard", "change"), rows),
                new Block.Paragraph("Rounding moves the worst phase margin from " + degrees(pmIdeal) + " to "
                        + degrees(pmStd) + " and the highest crossover from " + hz(r.idealLoop().highestCrossoverHz())
                        + " to " + hz(r.roundedLoop().highestCrossoverHz()) + ".", Block.Tone.PLAIN)));
    }

    private static Section margins(ReportInput in) {
        DesignResult r = in.design();
        List<List<String>> rows = new ArrayList<>();
        for (int i = 0; i < r.roundedLoop().results().size(); i++) {
            CornerResult c = r.roundedLoop().results().get(i);
            LoopMargins m = c.margins();
            LoopMargins ideal = r.idealLoop().results().get(i).margins();
            PhaseCrossover g = m.worstGain();
            rows.add(List.of(CornerNames.corner(c.corner()), c.corner().point().mode().label(), hz(m.crossoverHz()),
                    degrees(m.phaseMarginDeg()), degrees(ideal.phaseMarginDeg()),
                    g == null ? "∞" : decibels(g.gainMarginDb()) + " at " + hz(g.frequencyHz()),
                    SiText.format(m.delayMarginS(), "s", 3), SiText.plain(m.modulusMargin(), 3),
                    m.verdict().label(), c.meetsTargets() ? "met" : String.join("; ", c.misses())));
        }
        List<Block> b = new ArrayList<>();
        b.add(new Block.Table("Margins with standard parts (phase margin with exact parts beside it)",
                List.of("corner", "mode", "fc", "PM", "PM exact", "GM", "delay margin", "modulus margin",
                        "closed loop", "targets"), rows));
        b.add(picture("loop-gain", "Loop gain at every corner; crossovers and margins of the worst corner labelled, "
                + "those of the other corners marked.", BodePlot.figure(in.curves().loop())));
        b.add(picture("closed-loop", "Closed-loop reference-to-output response at every corner.",
                BodePlot.figure(in.curves().closedLoop())));
        LoadStepResponse step = LoadStepCurves.linearResponse(r, in.loadStepA());
        b.add(new Block.Paragraph("Load step of " + LoadStepCurves.signed(in.loadStepA(), "A") + " at the worst "
                + "corner, linear model: peak deviation " + SiText.format(step.peakDeviationV(), "V", 3) + " after "
                + SiText.format(step.peakTimeS(), "s", 3) + "; " + settling(step) + ".", Block.Tone.PLAIN));
        b.add(picture("load-step", "Output deviation after the load step; settling band and peak marked.",
                StepPlot.figure(in.curves().loadStep())));
        if (in.curves().lineStep() != null) {
            b.add(picture("line-step", "Output after a line step.", StepPlot.figure(in.curves().lineStep())));
        }
        if (in.curves().startUp() != null) {
            b.add(picture("start-up", "Output during start-up.", StepPlot.figure(in.curves().startUp())));
        }
        return new Section("margins", "Margins and responses", b);
    }

    private static Section rulesOfThumb(ReportInput in) {
        List<String> items = new ArrayList<>();
        for (String rule : in.design().rulesOfThumb()) {
            items.add(rule.contains("common practice") ? rule : rule + " (common practice, no source)");
        }
        items.add("load step of half the largest load for the linear response (common practice, no source)");
        return new Section("rules-of-thumb", "Rules of thumb used", List.of(
                new Block.Paragraph("These choices are common practice with no published derivation behind them; "
                        + "change them in the spec where they do not suit the design.", Block.Tone.PLAIN),
                new Block.Bullets(items)));
    }

    private static String settling(LoadStepResponse s) {
        String band = "±" + SiText.format(s.settlingBandV(), "V", 3);
        if (Double.isNaN(s.settlingTimeS())) {
            return "not settled within " + band + " in the simulated window";
        }
        return s.settlingTimeS() == 0 ? "never leaves the settling band " + band
                : "settles within " + band + " after " + SiText.format(s.settlingTimeS(), "s", 3);
    }

    private static Map<OperatingPoint, StageTransferFunctions> distinctPoints(DesignResult r) {
        Map<OperatingPoint, StageTransferFunctions> m = new LinkedHashMap<>();
        r.corners().forEach(c -> m.putIfAbsent(c.point(), c.stage()));
        return m;
    }

    private static Block.Picture picture(String file, String caption, org.flyloop.cli.plot.Figure f) {
        return new Block.Picture(file, caption, new FigureRenderer(f));
    }

    private static String frequencies(List<Double> hz) {
        if (hz.isEmpty()) {
            return "none";
        }
        List<String> s = new ArrayList<>();
        hz.forEach(f -> s.add(hz(f)));
        return String.join(", ", s);
    }

    static String hz(double f) {
        return SiText.format(f, "Hz", 3);
    }

    static String degrees(double d) {
        return SiText.fixed(d, 1) + "°";
    }

    static String decibels(double d) {
        return Double.isInfinite(d) ? "∞" : SiText.fixed(d, 1) + " dB";
    }
}
