package org.flyloop.cli.command;

import java.nio.file.Path;
import picocli.CommandLine.Option;

/**
 * {@code --netlist FILE.cir}: the averaged model at the chosen point as a SPICE netlist for
 * {@code ngspice -b}, with the AC source on the control input and the sweep of {@code --freq}.
 */
public final class StageNetlistOptions {

    /** Used when the file name leaves nothing usable for the names of ngspice's output files. */
    static final String FALLBACK_BASE = "flyloop";

    @Option(names = "--netlist", paramLabel = "FILE.cir",
            description = "Write the averaged model at the chosen point as an ngspice netlist (AC sweep of the"
                    + " control input).")
    private Path netlistFile;

    /** True when {@code --netlist} was given. */
    public boolean requested() {
        return netlistFile != null;
    }

    /** The netlist file, or null. */
    public Path file() {
        return netlistFile;
    }

    /**
     * The base name of the data files the netlist makes ngspice write ({@code <base>_op.txt},
     * {@code <base>_ac.txt}): the netlist's file name without its extension, with every character
     * other than letters, digits, {@code _ . -} replaced by {@code _}.
     */
    public String outputBaseName() {
        String name = netlistFile.getFileName().toString();
        int dot = name.lastIndexOf('.');
        String stem = dot > 0 ? name.substring(0, dot) : name;
        String base = stem.replaceAll("[^A-Za-z0-9_.-]", "_");
        return base.isEmpty() || base.matches("[._-]*") ? FALLBACK_BASE : base;
    }
}
