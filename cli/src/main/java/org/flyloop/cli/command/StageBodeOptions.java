package org.flyloop.cli.command;

import java.nio.file.Path;
import java.util.Locale;
import org.flyloop.cli.output.StageModelQuantity;
import org.flyloop.cli.spec.InputException;
import picocli.CommandLine.Option;

/**
 * {@code --bode FILE.csv} with the model ({@code --model}) and the transfer function
 * ({@code --quantity}) it writes.
 */
public final class StageBodeOptions {

    @Option(names = "--bode", paramLabel = "FILE.csv",
            description = "Write the frequency response at the chosen point as CSV (needs one --vin and one --iout).")
    private Path bodeFile;

    @Option(names = "--model", paramLabel = "MODEL",
            description = "Model for --bode: analytic (default), averaged, or both side by side with their difference.")
    private String modelText;

    @Option(names = "--quantity", paramLabel = "Q",
            description = "Transfer function for --bode: control (default, vout/vc), duty (vout/d), line (vout/vin)"
                    + " or zout (output impedance).")
    private String quantityText;

    /** Which model a Bode file comes from. */
    public enum Model {
        /** The closed-form small-signal model. */
        ANALYTIC,
        /** The numerical linearization of the large-signal averaged model. */
        AVERAGED,
        /** Both, with their difference. */
        BOTH;

        /** The option spelling. */
        public String word() {
            return name().toLowerCase(Locale.ROOT);
        }

        /** True when the analytic model is part of the file. */
        public boolean usesAnalytic() {
            return this != AVERAGED;
        }

        /** True when the averaged model is part of the file. */
        public boolean usesAveraged() {
            return this != ANALYTIC;
        }
    }

    /** True when {@code --bode} was given. */
    public boolean requested() {
        return bodeFile != null;
    }

    /** The file to write, or null. */
    public Path file() {
        return bodeFile;
    }

    /**
     * Parses {@code --model} and {@code --quantity} and refuses them without {@code --bode}, so a
     * mistyped command line fails before any model is built.
     */
    public void check() {
        model();
        quantity();
        if (bodeFile == null) {
            String stray = modelText != null ? "--model" : quantityText != null ? "--quantity" : null;
            if (stray != null) {
                throw new InputException(stray, "applies to --bode only", "add --bode FILE.csv");
            }
        }
    }

    /** The chosen model, analytic by default. */
    public Model model() {
        if (modelText == null) {
            return Model.ANALYTIC;
        }
        for (Model m : Model.values()) {
            if (m.word().equals(modelText.strip())) {
                return m;
            }
        }
        throw new InputException("--model", "unknown model '" + modelText.strip() + "'",
                "write analytic, averaged or both");
    }

    /** The chosen transfer function, control-to-output by default. */
    public StageModelQuantity quantity() {
        if (quantityText == null) {
            return StageModelQuantity.CONTROL;
        }
        for (StageModelQuantity q : StageModelQuantity.values()) {
            if (q.word().equals(quantityText.strip())) {
                return q;
            }
        }
        throw new InputException("--quantity", "unknown quantity '" + quantityText.strip() + "'",
                "write control, duty, line or zout");
    }
}
