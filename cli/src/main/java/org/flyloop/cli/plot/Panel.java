package org.flyloop.cli.plot;

import java.util.List;

/**
 * One plot area of a figure; panels of a figure are stacked and share the x axis.
 *
 * @param name         short identifier, written into the SVG ("magnitude", "phase", …)
 * @param quantity     what the y axis shows, e.g. "magnitude"
 * @param unit         its unit, e.g. "dB", "°", "V"
 * @param scale        how the y axis steps (LOG is not offered for y)
 * @param traces       curves, drawn in order with emphasised ones on top
 * @param markers      marked points
 * @param guides       horizontal reference lines
 * @param bands        horizontal bands
 * @param heightWeight relative height (1 = standard)
 * @param minimumSpan  smallest y range shown, panel units (0: fit the data however flat), so that
 *                     a tiny difference is not blown up to fill the panel
 */
public record Panel(String name, String quantity, String unit, Scale scale, List<Trace> traces,
                    List<Marker> markers, List<ReferenceLine> guides, List<Band> bands, double heightWeight,
                    double minimumSpan) {

    public Panel {
        if (scale == Scale.LOG) {
            throw new IllegalArgumentException("logarithmic y axes are not offered");
        }
        traces = List.copyOf(traces);
        markers = List.copyOf(markers);
        guides = List.copyOf(guides);
        bands = List.copyOf(bands);
        if (!(heightWeight > 0)) {
            throw new IllegalArgumentException("height weight must be positive");
        }
    }

    /** A panel with traces only. */
    public static Panel of(String name, String quantity, String unit, Scale scale, List<Trace> traces) {
        return new Panel(name, quantity, unit, scale, traces, List.of(), List.of(), List.of(), 1, 0);
    }
}
