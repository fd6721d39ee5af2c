package org.flyloop.cli.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import javax.xml.parsers.DocumentBuilderFactory;
import org.flyloop.cli.plot.PlotFiles;
import org.flyloop.design.Designer;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.NetworkKind;
import org.flyloop.network.PartNames;
import org.flyloop.network.PartRole;
import org.junit.jupiter.api.Test;
import org.w3c.dom.NodeList;

/**
 * Every network kind is drawn, and every resistor and capacitor of the network appears on the
 * drawing with its name and its value as the parts list gives it.
 */
class SchematicTest {

    private static List<String> texts(String svg) throws Exception {
        var f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        var d = f.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
        NodeList l = d.getElementsByTagNameNS("http://www.w3.org/2000/svg", "text");
        List<String> out = new ArrayList<>();
        for (int i = 0; i < l.getLength(); i++) {
            out.add(l.item(i).getTextContent());
        }
        return out;
    }

    private static void check(CompensatorNetwork n, NetworkKind kind) throws Exception {
        assertEquals(kind, n.kind());
        List<String> texts = texts(PlotFiles.svg(new CompensatorSchematic(n, 2.5, 5)));
        for (Map.Entry<String, Double> p : n.parts().entrySet()) {
            if (PartNames.role(p.getKey()) == PartRole.DEVICE && !p.getKey().equals(PartNames.C_OPTO)) {
                continue;
            }
            int at = texts.indexOf(p.getKey());
            assertTrue(at >= 0, kind + ": no label " + p.getKey() + " in " + texts);
            assertEquals(PartText.value(p.getKey(), p.getValue()), texts.get(at + 1), kind + " " + p.getKey());
        }
        assertTrue(PlotFiles.png(new CompensatorSchematic(n, 2.5, 5)).getWidth() > 1000);
    }

    @Test
    void opAmpTypesOneToThree() throws Exception {
        NetworkKind[] kinds = {NetworkKind.OPAMP_TYPE1, NetworkKind.OPAMP_TYPE2, NetworkKind.OPAMP_TYPE3};
        for (int type = 1; type <= 3; type++) {
            var r = Designer.design(DesignScenarios.voltageModeCcm(DesignScenarios.opamp(type)));
            check(r.rounded(), kinds[type - 1]);
        }
    }

    @Test
    void ota() throws Exception {
        check(DesignScenarios.dcmOta().rounded(), NetworkKind.OTA);
    }

    @Test
    void shuntRegulatorWithLedOptocouplerAndPullUp() throws Exception {
        CompensatorNetwork n = DesignScenarios.currentModeOpto().rounded();
        check(n, NetworkKind.SHUNT_OPTO);
        List<String> texts = texts(PlotFiles.svg(new CompensatorSchematic(n, 2.5, 5)));
        assertTrue(texts.containsAll(List.of("optocoupler", "isolation barrier", "V_pull 5 V", "shunt regulator")),
                texts::toString);
    }
}
