package org.flyloop.cli.plot;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;

/** Renders figures to SVG text and PNG images, and writes them to files. */
public final class PlotFiles {

    /** Image pixels per figure pixel in PNGs: sharp in print, modest in size. */
    public static final double PNG_SCALE = 1.5;

    private PlotFiles() {
    }

    /** The figure as a standalone {@code <svg>} element (also valid inline in XHTML). */
    public static String svg(Figure figure) {
        return svg(new FigureRenderer(figure));
    }

    /** A drawing as a standalone {@code <svg>} element (also valid inline in XHTML). */
    public static String svg(Drawing d) {
        SvgCanvas c = new SvgCanvas(d.width(), d.height(), d.title());
        d.paint(c);
        return c.toSvg();
    }

    /** The figure as an RGB image. */
    public static BufferedImage png(Figure figure) {
        return png(new FigureRenderer(figure));
    }

    /** A drawing as an RGB image at {@link #PNG_SCALE}. */
    public static BufferedImage png(Drawing d) {
        RasterCanvas c = new RasterCanvas(d.width(), d.height(), PNG_SCALE);
        d.paint(c);
        c.dispose();
        return c.image();
    }

    /** Writes the SVG, UTF-8, with an XML declaration (a standalone file). */
    public static void writeSvg(Figure figure, Path file) throws IOException {
        Files.writeString(file, "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" + svg(figure), StandardCharsets.UTF_8);
    }

    /** Writes the PNG. */
    public static void writePng(Figure figure, Path file) throws IOException {
        writePng(png(figure), file);
    }

    /** Writes an image as PNG. */
    public static void writePng(BufferedImage image, Path file) throws IOException {
        if (!ImageIO.write(image, "png", file.toFile())) {
            throw new IOException("no PNG writer available");
        }
    }

    /** Writes {@code dir/baseName.svg} and {@code dir/baseName.png}. */
    public static void writeBoth(Figure figure, Path dir, String baseName) throws IOException {
        writeSvg(figure, dir.resolve(baseName + ".svg"));
        writePng(figure, dir.resolve(baseName + ".png"));
    }
}
