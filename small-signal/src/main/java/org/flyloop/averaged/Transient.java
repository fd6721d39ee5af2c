package org.flyloop.averaged;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;

/**
 * The result of a large-signal simulation: samples on a uniform time grid, the located mode
 * changes, and the final state. Immutable.
 */
public final class Transient {

    private final String scenarioName;
    private final List<TransientSample> samples;
    private final List<ModeChange> modeChanges;
    private final double[] finalState;

    Transient(String scenarioName, List<TransientSample> samples, List<ModeChange> modeChanges, double[] finalState) {
        this.scenarioName = scenarioName;
        this.samples = Collections.unmodifiableList(new ArrayList<>(samples));
        this.modeChanges = Collections.unmodifiableList(new ArrayList<>(modeChanges));
        this.finalState = finalState.clone();
    }

    public String scenarioName() {
        return scenarioName;
    }

    public List<TransientSample> samples() {
        return samples;
    }

    public List<ModeChange> modeChanges() {
        return modeChanges;
    }

    public double[] finalState() {
        return finalState.clone();
    }

    public TransientSample last() {
        return samples.get(samples.size() - 1);
    }

    /** The output voltages of all samples in time order, V. */
    public double[] voutV() {
        return samples.stream().mapToDouble(TransientSample::voutV).toArray();
    }

    /** The sample times, s. */
    public double[] timeS() {
        return samples.stream().mapToDouble(TransientSample::timeS).toArray();
    }

    /** Comma-separated table with a header row: time_s, vout_v, im_a, vc_v, control, d, d2, mode. */
    public String toCsv() {
        StringBuilder sb = new StringBuilder("time_s,vout_v,im_a,vc_v,control,d,d2,mode\n");
        for (TransientSample s : samples) {
            sb.append(String.format(Locale.ROOT, "%.9g,%.9g,%.9g,%.9g,%.9g,%.9g,%.9g,%s%n", s.timeS(), s.voutV(),
                    s.imA(), s.capacitorV(), s.control(), s.duty(), s.duty2(), s.mode().label()));
        }
        return sb.toString();
    }
}
