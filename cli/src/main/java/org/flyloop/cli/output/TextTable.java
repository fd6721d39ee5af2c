package org.flyloop.cli.output;

import java.util.ArrayList;
import java.util.List;

/**
 * A plain-text table with one header line, columns separated by two spaces, text left-aligned and
 * numbers right-aligned. Built up row by row, rendered once.
 */
public final class TextTable {

    private final List<String> headers;
    private final List<Boolean> rightAligned;
    private final List<List<String>> rows = new ArrayList<>();

    /** @param columns the columns, in order */
    public TextTable(List<Column> columns) {
        this.headers = columns.stream().map(Column::header).toList();
        this.rightAligned = columns.stream().map(Column::rightAligned).toList();
    }

    /** Adds a row; it must have one cell per column. */
    public TextTable add(List<String> cells) {
        if (cells.size() != headers.size()) {
            throw new IllegalArgumentException("row has " + cells.size() + " cells, table has " + headers.size() + " columns");
        }
        rows.add(List.copyOf(cells));
        return this;
    }

    /** The table as text, one line per row after the header, each ending in a newline. */
    public String render() {
        int[] width = new int[headers.size()];
        for (int c = 0; c < width.length; c++) {
            width[c] = headers.get(c).length();
            for (List<String> row : rows) {
                width[c] = Math.max(width[c], row.get(c).length());
            }
        }
        StringBuilder out = new StringBuilder();
        appendLine(out, headers, width);
        for (List<String> row : rows) {
            appendLine(out, row, width);
        }
        return out.toString();
    }

    private void appendLine(StringBuilder out, List<String> cells, int[] width) {
        StringBuilder line = new StringBuilder();
        for (int c = 0; c < cells.size(); c++) {
            if (c > 0) {
                line.append("  ");
            }
            String cell = cells.get(c);
            String pad = " ".repeat(width[c] - cell.length());
            line.append(rightAligned.get(c) ? pad + cell : cell + pad);
        }
        out.append(line.toString().stripTrailing()).append('\n');
    }

    /**
     * One column.
     *
     * @param header       the header text, with the unit in brackets where there is one
     * @param rightAligned true for numbers
     */
    public record Column(String header, boolean rightAligned) {
        /** A right-aligned numeric column. */
        public static Column number(String header) {
            return new Column(header, true);
        }

        /** A left-aligned text column. */
        public static Column text(String header) {
            return new Column(header, false);
        }
    }
}
