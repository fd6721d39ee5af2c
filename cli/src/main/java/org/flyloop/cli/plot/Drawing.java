package org.flyloop.cli.plot;

/** Anything that paints itself on a {@link Canvas} of known size: a figure, a schematic. */
public interface Drawing {

    /** Accessible title. */
    String title();

    /** Width, figure pixels. */
    double width();

    /** Height, figure pixels. */
    double height();

    void paint(Canvas canvas);
}
