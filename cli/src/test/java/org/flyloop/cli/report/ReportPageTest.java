package org.flyloop.cli.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilderFactory;
import org.flyloop.cli.plot.Emphasis;
import org.flyloop.cli.plot.StepData;
import org.flyloop.cli.plot.Trace;
import org.jsoup.Jsoup;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Attr;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NamedNodeMap;
import org.w3c.dom.Node;
import org.w3c.dom.NodeList;

/**
 * One full report (current mode, shunt regulator and optocoupler, 8 corners, with every optional
 * extra) read back: the HTML as XML with the JDK parser and as a browser would with jsoup, the
 * Markdown, and the data files.
 */
class ReportPageTest {

    @TempDir
    static Path tmp;
    static Path dir;
    static String html;

    @BeforeAll
    static void writeReport() throws IOException {
        ReportInput in = ReportInput.from(DesignScenarios.currentModeOpto(), "charger demo");
        double[] t = {0, 1e-4, 2e-4, 5e-4, 1e-3};
        double[] dv = {0, -0.02, -0.03, -0.01, 0};
        in = in.withAveragedLoadStep(t, dv)
                .withLineStep(StepData.of("Line step", "", "output deviation", "V",
                        List.of(new Trace("linear", t, dv, Emphasis.STRONG))))
                .withEnvelope(new EnvelopeSummary("tolerance extremes", 64, true, List.of(
                        new EnvelopeSummary.WorstCase("phase margin", 48.2, "°", "Lm −10 %, 90 V / 2 A")), List.of()))
                .withMonteCarlo(new MonteCarloSummary(1000, 7, 993, List.of(new MonteCarloSummary.Distribution(
                        "phase margin", "°", 44, 47, 60, 70, 75)), List.of("seven runs missed the gain margin")));
        dir = ReportWriter.write(in, tmp.resolve("charger-demo"));
        html = Files.readString(dir.resolve(HtmlPage.FILE), StandardCharsets.UTF_8);
    }

    private static Document xml() throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", false);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        return f.newDocumentBuilder().parse(dir.resolve(HtmlPage.FILE).toFile());
    }

    @Test
    void htmlIsWellFormedXhtmlWithEverySectionInOrder() throws Exception {
        Document d = xml();
        Element root = d.getDocumentElement();
        assertEquals("html", root.getLocalName());
        assertEquals("http://www.w3.org/1999/xhtml", root.getNamespaceURI());
        NodeList sections = d.getElementsByTagNameNS("http://www.w3.org/1999/xhtml", "section");
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < sections.getLength(); i++) {
            ids.add(((Element) sections.item(i)).getAttribute("id"));
        }
        assertEquals(ReportDocument.SECTION_IDS, ids);
        NodeList svgs = d.getElementsByTagNameNS("http://www.w3.org/2000/svg", "svg");
        // stage, agreement, schematic, compensator, loop, closed loop, load step, line step
        assertEquals(8, svgs.getLength());
    }

    @Test
    void jsoupSeesTheSameHeadingsAndTheContentEachSectionPromises() {
        org.jsoup.nodes.Document d = Jsoup.parse(html);
        assertEquals(ReportDocument.SECTION_IDS, d.select("main > section").eachAttr("id"));
        assertEquals("Verdict", d.select("section#verdict > h2").text());
        assertTrue(d.select("section#verdict p.pass").text().startsWith("Targets met at every corner"));
        assertTrue(d.select("section#spec td").eachText().contains("90 V … 375 V"));
        assertEquals(4, d.select("section#operating-points tbody tr").size(), "distinct vin × iout points");
        assertTrue(d.select("section#stage td").eachText().contains("RHP zero"));
        assertFalse(d.select("section#compensator figure#fig-compensator-schematic svg").isEmpty());
        assertTrue(d.select("section#parts td").eachText().contains("r_zero") || d.select("section#parts td")
                .eachText().contains("c_zero"));
        assertEquals(8, d.select("section#margins table").first().select("tbody tr").size(), "one row per corner");
        assertTrue(d.select("section#envelope").text().contains("993 met every target"));
        assertTrue(d.select("section#warnings li").eachText().stream().anyMatch(w -> w.contains("subharmonic")));
        assertTrue(d.select("section#rules-of-thumb li").eachText().stream()
                .allMatch(r -> r.contains("common practice")));
        String safety = d.select("section#safety").text();
        for (String must : List.of("lethal", "isolation", "frequency-response analyzer", "safety standards",
                "local codes", "licensed practice")) {
            assertTrue(safety.contains(must), must);
        }
        assertTrue(d.select("section#averaged-model").text().contains("no sampling effect"));
        assertTrue(d.select("figure#fig-load-step").text().contains("averaged model (large signal)"));
    }

    @Test
    void htmlReferencesNothingOutsideItself() throws Exception {
        Document d = xml();
        List<String> offending = new ArrayList<>();
        walk(d.getDocumentElement(), offending);
        assertTrue(offending.isEmpty(), offending::toString);
        org.jsoup.nodes.Document j = Jsoup.parse(html);
        assertTrue(j.select("script, link, img, iframe, object, embed, base, [src]").isEmpty());
        for (org.jsoup.nodes.Element a : j.select("[href]")) {
            assertTrue(a.attr("href").startsWith("#"), a.outerHtml());
        }
    }

    /** Every attribute value and text node, namespace declarations aside, must name no other resource. */
    private static void walk(Node n, List<String> offending) {
        if (n instanceof Element e) {
            NamedNodeMap attrs = e.getAttributes();
            for (int i = 0; i < attrs.getLength(); i++) {
                Attr a = (Attr) attrs.item(i);
                if (a.getName().equals("xmlns") || a.getName().startsWith("xmlns:")) {
                    continue;
                }
                if (external(a.getValue()) || a.getLocalName().equals("src")) {
                    offending.add(e.getLocalName() + "@" + a.getName() + "=" + a.getValue());
                }
            }
        } else if (n.getNodeType() == Node.TEXT_NODE && external(n.getNodeValue())) {
            offending.add("text: " + n.getNodeValue().strip());
        }
        for (Node c = n.getFirstChild(); c != null; c = c.getNextSibling()) {
            walk(c, offending);
        }
    }

    private static boolean external(String s) {
        String v = s.toLowerCase(java.util.Locale.ROOT);
        return v.contains("http:") || v.contains("https:") || v.contains("//") || v.contains("url(")
                || v.contains("@import") || v.contains("file:");
    }

    @Test
    void markdownCarriesTheSameSectionsAndItsPicturesExistAsPng() throws IOException {
        String md = Files.readString(dir.resolve(MarkdownPage.FILE), StandardCharsets.UTF_8);
        List<String> headings = md.lines().filter(l -> l.startsWith("## ")).map(l -> l.substring(3)).toList();
        List<String> htmlHeadings = Jsoup.parse(html).select("main h2").eachText();
        assertEquals(htmlHeadings, headings);
        Matcher m = Pattern.compile("!\\[[^]]*]\\(([^)]+)\\)").matcher(md);
        int pictures = 0;
        while (m.find()) {
            pictures++;
            assertTrue(m.group(1).endsWith(".png"), m.group(1));
            assertTrue(Files.size(dir.resolve(m.group(1))) > 10_000, m.group(1));
            assertTrue(Files.exists(dir.resolve(m.group(1).replace(".png", ".svg"))));
        }
        assertEquals(8, pictures);
    }

    @Test
    void resultJsonIsWrittenWhenTheCallerGaveNone() throws IOException {
        JsonNode json = new ObjectMapper().readTree(dir.resolve("data").resolve(DataFiles.RESULT).toFile());
        assertTrue(json.get("targets_met").asBoolean());
        assertEquals(8, json.get("corners").size());
        assertNotNull(json.get("parts_standard").get("r_pullup"));
    }
}
