package org.flyloop.cli.plot;

/** How much a trace stands out. */
public enum Emphasis {
    /** The trace a reader must find first (worst corner, the reference model): thick, solid, black. */
    STRONG,
    /** Every other trace: thin, with its own dash pattern, glyph and muted colour. */
    NORMAL
}
