package org.flyloop.cli.report;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.flyloop.cli.plot.AgreementData;
import org.flyloop.cli.plot.BodeData;
import org.flyloop.cli.plot.BodeTrace;
import org.flyloop.cli.plot.StepData;
import org.flyloop.cli.plot.Trace;

/**
 * {@code data/}: every curve as CSV (first column {@code freq_hz} or {@code time_s}, one column
 * per trace and quantity, full double precision, plain ASCII headers) and the result as
 * {@code result.json}. Traces that share their abscissae share a file; a trace on other
 * abscissae gets a file of its own, suffixed with its name.
 */
public final class DataFiles implements ReportPart {

    /** Folder inside the report folder. */
    public static final String FOLDER = "data";
    /** The result file inside {@link #FOLDER}. */
    public static final String RESULT = "result.json";

    @Override
    public void writeInto(RenderedReport report, Path dir) throws IOException {
        Path data = Files.createDirectories(dir.resolve(FOLDER));
        ReportCurves c = report.input().curves();
        bode(data, "stage-bode", c.stage());
        bode(data, "compensator-bode", c.compensator());
        bode(data, "loop-gain", c.loop());
        bode(data, "closed-loop", c.closedLoop());
        if (c.agreement() != null) {
            agreement(data, c.agreement());
        }
        step(data, "load-step", c.loadStep());
        if (c.lineStep() != null) {
            step(data, "line-step", c.lineStep());
        }
        if (c.startUp() != null) {
            step(data, "start-up", c.startUp());
        }
        ObjectMapper json = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        var node = report.input().resultJson() != null ? report.input().resultJson()
                : ResultSummary.of(report.input());
        Files.writeString(data.resolve(RESULT), json.writeValueAsString(node) + "\n", StandardCharsets.UTF_8);
    }

    private static void bode(Path data, String name, BodeData d) throws IOException {
        Map<String, double[]> cols = new LinkedHashMap<>();
        List<double[]> xs = new ArrayList<>();
        List<String> owners = new ArrayList<>();
        for (BodeTrace t : d.traces()) {
            xs.add(t.frequencyHz());
            owners.add(t.name());
        }
        Set<String> used = new HashSet<>();
        for (BodeTrace t : d.traces()) {
            String s = unique(slug(t.name()), used);
            cols.put(s + "_mag_db", t.magnitudeDb());
            cols.put(s + "_phase_deg", t.phaseDeg());
        }
        write(data, name, "freq_hz", xs, owners, cols, 2);
    }

    private static void agreement(Path data, AgreementData d) throws IOException {
        Map<String, double[]> cols = new LinkedHashMap<>();
        Set<String> used = new HashSet<>();
        for (BodeTrace t : d.bodeTraces()) {
            String s = unique(slug(t.name()), used);
            cols.put(s + "_mag_db", t.magnitudeDb());
            cols.put(s + "_phase_deg", t.phaseDeg());
        }
        cols.put("difference_db", d.differenceDb());
        cols.put("difference_deg", d.differenceDeg());
        Files.writeString(data.resolve("model-agreement.csv"), csv("freq_hz", d.reference().frequencyHz(), cols),
                StandardCharsets.UTF_8);
    }

    private static void step(Path data, String name, StepData d) throws IOException {
        Map<String, double[]> cols = new LinkedHashMap<>();
        List<double[]> xs = new ArrayList<>();
        List<String> owners = new ArrayList<>();
        Set<String> used = new HashSet<>();
        for (Trace t : d.series()) {
            xs.add(t.x());
            owners.add(t.name());
            cols.put(unique(slug(t.name()), used) + "_" + unitSuffix(d.unit()), t.y());
        }
        write(data, name, "time_s", xs, owners, cols, 1);
    }

    /** Groups columns by identical abscissae; the first group keeps the plain name. */
    private static void write(Path data, String name, String xHeader, List<double[]> xs, List<String> owners,
                              Map<String, double[]> cols, int colsPerTrace) throws IOException {
        List<String> keys = new ArrayList<>(cols.keySet());
        boolean[] done = new boolean[xs.size()];
        for (int i = 0; i < xs.size(); i++) {
            if (done[i]) {
                continue;
            }
            Map<String, double[]> group = new LinkedHashMap<>();
            for (int j = i; j < xs.size(); j++) {
                if (!done[j] && Arrays.equals(xs.get(i), xs.get(j))) {
                    done[j] = true;
                    for (int k = 0; k < colsPerTrace; k++) {
                        String key = keys.get(j * colsPerTrace + k);
                        group.put(key, cols.get(key));
                    }
                }
            }
            String file = i == 0 ? name : name + "-" + slug(owners.get(i)).replace('_', '-');
            Files.writeString(data.resolve(file + ".csv"), csv(xHeader, xs.get(i), group), StandardCharsets.UTF_8);
        }
    }

    static String csv(String xHeader, double[] x, Map<String, double[]> cols) {
        StringBuilder b = new StringBuilder(x.length * 16 * (cols.size() + 1));
        b.append(xHeader);
        cols.keySet().forEach(k -> b.append(',').append(k));
        b.append('\n');
        for (int i = 0; i < x.length; i++) {
            b.append(x[i]);
            for (double[] c : cols.values()) {
                b.append(',').append(Double.isFinite(c[i]) ? Double.toString(c[i]) : "");
            }
            b.append('\n');
        }
        return b.toString();
    }

    /** Lower-case ASCII letters, digits and single underscores; "µ" becomes "u", "%" "pct". */
    static String slug(String s) {
        String t = s.toLowerCase(Locale.ROOT).replace("µ", "u").replace("%", "pct").replace("ω", "ohm")
                .replace("Ω".toLowerCase(Locale.ROOT), "ohm");
        String out = t.replaceAll("[^a-z0-9]+", "_").replaceAll("^_+|_+$", "");
        return out.isEmpty() ? "trace" : out;
    }

    private static String unique(String s, Set<String> used) {
        String u = s;
        for (int k = 2; !used.add(u); k++) {
            u = s + "_" + k;
        }
        return u;
    }

    private static String unitSuffix(String unit) {
        String s = slug(unit);
        return s.equals("trace") ? "value" : s;
    }
}
