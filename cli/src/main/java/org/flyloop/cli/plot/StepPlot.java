package org.flyloop.cli.plot;

import java.util.List;

/** A step or transient figure: one panel over a linear time axis in seconds. */
public final class StepPlot {

    private StepPlot() {
    }

    public static Figure figure(StepData d) {
        Panel p = new Panel("response", d.quantity(), d.unit(), Scale.LINEAR, d.series(), d.markers(),
                List.of(ReferenceLine.guide(0)), d.bands(), 1.25, 0);
        return new Figure(d.title(), d.subtitle(), "time", "s", Scale.LINEAR, List.of(p), d.verticals());
    }
}
