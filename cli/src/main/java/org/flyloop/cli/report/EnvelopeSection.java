package org.flyloop.cli.report;

import java.util.ArrayList;
import java.util.List;
import org.flyloop.cli.plot.SiText;

/** The report section for the tolerance envelope and the Monte Carlo run, whichever were computed. */
final class EnvelopeSection {

    private EnvelopeSection() {
    }

    static Section of(EnvelopeSummary envelope, MonteCarloSummary monteCarlo) {
        List<Block> b = new ArrayList<>();
        if (envelope == null && monteCarlo == null) {
            b.add(new Block.Paragraph("No tolerance envelope or Monte Carlo analysis was run for this report; the "
                    + "margins above hold for the nominal parts at the listed corners only.", Block.Tone.CAUTION));
        }
        if (envelope != null) {
            b.add(new Block.Paragraph("Tolerance envelope, " + envelope.method() + ": " + envelope.cases()
                    + " cases, targets " + (envelope.targetsMet() ? "met in every case." : "missed in some cases."),
                    envelope.targetsMet() ? Block.Tone.PASS : Block.Tone.FAIL));
            List<List<String>> rows = new ArrayList<>();
            for (EnvelopeSummary.WorstCase w : envelope.worstCases()) {
                rows.add(List.of(w.quantity(), value(w.value(), w.unit()), w.condition()));
            }
            b.add(new Block.Table("Worst case of each figure over the envelope", List.of("quantity", "worst", "where"),
                    rows));
            if (!envelope.notes().isEmpty()) {
                b.add(new Block.Bullets(envelope.notes()));
            }
        }
        if (monteCarlo != null) {
            b.add(new Block.Paragraph("Monte Carlo: " + monteCarlo.runs() + " runs (seed " + monteCarlo.seed() + "), "
                    + monteCarlo.runsMeetingTargets() + " met every target ("
                    + SiText.fixed(100 * monteCarlo.yield(), 1) + " %).",
                    monteCarlo.runsMeetingTargets() == monteCarlo.runs() ? Block.Tone.PASS : Block.Tone.FAIL));
            List<List<String>> rows = new ArrayList<>();
            for (MonteCarloSummary.Distribution d : monteCarlo.distributions()) {
                rows.add(List.of(d.quantity(), value(d.min(), d.unit()), value(d.p01(), d.unit()),
                        value(d.median(), d.unit()), value(d.p99(), d.unit()), value(d.max(), d.unit())));
            }
            b.add(new Block.Table("Spread over the runs", List.of("quantity", "min", "1 %", "median", "99 %", "max"),
                    rows));
            if (!monteCarlo.notes().isEmpty()) {
                b.add(new Block.Bullets(monteCarlo.notes()));
            }
        }
        return new Section("envelope", "Tolerance envelope and Monte Carlo", b);
    }

    /** Degrees and decibels as plain numbers with the unit; SI units with a prefix. */
    static String value(double v, String unit) {
        if (unit.equals("°")) {
            return SiText.fixed(v, 1) + "°";
        }
        if (unit.equals("dB") || unit.equals("%") || unit.isEmpty()) {
            return SiText.plain(v, 3) + (unit.isEmpty() ? "" : " " + unit);
        }
        return SiText.format(v, unit, 3);
    }
}
