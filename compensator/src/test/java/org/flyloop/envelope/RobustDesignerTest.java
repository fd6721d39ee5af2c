package org.flyloop.envelope;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.flyloop.design.Corner;
import org.flyloop.design.DesignRequest;
import org.flyloop.design.LoopEvaluation;
import org.flyloop.eseries.ESeries;
import org.flyloop.network.CompensatorNetwork;
import org.flyloop.network.PartNames;
import org.flyloop.network.PartRole;
import org.flyloop.spec.StageSpec;
import org.junit.jupiter.api.Test;

class RobustDesignerTest {

    @Test
    void robustPlacementRaisesTheWorstCasePhaseMarginAndKeepsTheCrossover() {
        DesignRequest r = EnvelopeCases.voltageModeCcm(EnvelopeCases.opamp(0));
        RobustDesign d = RobustDesigner.design(r, EnvelopeCases.full());
        assertTrue(d.improved());
        assertTrue(d.worst().phaseMargin().value() > d.startWorst().phaseMargin().value() + 3,
                d.startWorst().phaseMargin().value() + " → " + d.worst().phaseMargin().value());
        // the ideal network crosses at the designer's crossover at the corner with the largest stage gain
        double fc = d.start().placement().crossoverHz();
        assertEquals(fc, d.design().idealLoop().highestCrossoverHz(), 1e-6 * fc);
        // what gets built is on the spec's series (IEC 60063 E96 / E12)
        for (Map.Entry<String, Double> e : d.design().rounded().parts().entrySet()) {
            PartRole role = PartNames.role(e.getKey());
            if (role == PartRole.RESISTOR) {
                assertTrue(ESeries.E96.contains(e.getValue()), e.toString());
            } else if (role == PartRole.CAPACITOR) {
                assertTrue(ESeries.E12.contains(e.getValue()), e.toString());
            }
        }
    }

    /** The claimed worst phase margin, rebuilt from its corner and deviations and analysed from scratch. */
    @Test
    void theClaimedWorstCaseReproducesWithTheMarginAnalyzer() {
        DesignRequest r = EnvelopeCases.voltageModeCcm(EnvelopeCases.opamp(0));
        RobustDesign d = RobustDesigner.design(r, EnvelopeCases.full());
        WorstFigure pm = d.worst().phaseMargin();
        EnvelopeSetup setup = EnvelopeSetup.forWorstCase(r, d.design().rounded(), EnvelopeCases.full(),
                EnvelopeSetup.DEFAULT_POINTS);
        double[] u = new double[setup.box().size()];
        for (int j = 0; j < u.length; j++) {
            ToleranceParameter p = setup.box().parameters().get(j);
            u[j] = (pm.deviations().get(p.name()) - p.band().low()) / (p.band().high() - p.band().low());
        }
        StageSpec stage = setup.box().stageAt(r.stage(), u);
        CompensatorNetwork n = setup.network().withParts(setup.box().partsAt(setup.network(), u));
        Corner corner = EnvelopeCorners.resolveAll(java.util.List.of(pm.corner()), stage, r.control()).get(0);
        LoopEvaluation e = LoopEvaluation.of(n, java.util.List.of(corner), 1, stage.fswHz(), r.targets());
        assertEquals(e.results().get(0).margins().phaseMarginDeg(), pm.value(), 1e-4);
    }

    @Test
    void theResultIsNeverWorseThanTheDesignersOwn() {
        for (DesignRequest r : new DesignRequest[] {EnvelopeCases.currentMode(EnvelopeCases.ota(1e-3)),
                EnvelopeCases.dcm(EnvelopeCases.opamp(0))}) {
            RobustDesign d = RobustDesigner.design(r, EnvelopeCases.full());
            assertTrue(d.worst().phaseMargin().value() >= d.startWorst().phaseMargin().value());
            if (!d.improved()) {
                assertEquals(d.start(), d.design());
            }
        }
    }

    @Test
    void anIntegratorHasNothingToMove() {
        DesignRequest base = EnvelopeCases.dcm(EnvelopeCases.opamp(1));
        RobustDesign d = RobustDesigner.design(base, EnvelopeCases.partsOnly());
        assertFalse(d.improved());
        assertEquals(1, d.design().placement().type());
    }
}
