package org.flyloop.envelope;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.flyloop.design.Corner;
import org.flyloop.design.DesignRequest;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;
import org.flyloop.spec.ValueRange;
import org.flyloop.stage.ConductionMode;
import org.flyloop.stage.OperatingPointSolver;
import org.junit.jupiter.api.Test;

class EnvelopeCornersTest {

    /** 36–75 V to 12 V / 0.5–4 A with ideal switch (Rds = 0), so the textbook boundary applies. */
    private static StageSpec idealSwitchStage(double lm) {
        return new StageSpec(ValueRange.between(36, 75), 12, ValueRange.between(0.5, 4), 100e3, lm, 1, 2200e-6,
                20e-3, 0.4, 0);
    }

    /**
     * The boundary load of the ideal buck-boost: K = 2·Ls/(R·Ts) = (1 − D)² (R. W. Erickson and
     * D. Maksimović, Fundamentals of Power Electronics, 2nd ed., 2001, Table 5.2), with the
     * secondary-referred inductance Ls = Lm/N², the rectifier drop added to the output
     * (R = (Vout + Vf)/Iout) and D = Vr/(Vin + Vr), Vr = N·(Vout + Vf):
     * Iout = (Vout + Vf)·(1 − D)²·Ts/(2·Ls).
     */
    private static double textbookBoundaryLoad(StageSpec s, double vin) {
        double vr = s.turns() * (s.vout() + s.rectifierDrop());
        double d = vr / (vin + vr);
        return (s.vout() + s.rectifierDrop()) * (1 - d) * (1 - d) * s.periodS() / (2 * s.secondaryInductance());
    }

    @Test
    void boundaryCornersSitEitherSideOfTheTextbookBoundary() {
        StageSpec s = idealSwitchStage(60e-6);
        ControlSpec control = ControlSpec.voltageMode(1.8, 0.7);
        List<EnvelopeCorner> corners = EnvelopeCorners.of(s, control, EnvelopeCases.opamp(3));
        // per vin: 0.5 A, the DCM-side and CCM-side boundary loads, 4 A
        assertEquals(8, corners.size());
        List<Corner> resolved = EnvelopeCorners.resolveAll(corners, s, control);
        for (int i = 0; i < corners.size(); i++) {
            EnvelopeCorner c = corners.get(i);
            if (c.load() instanceof LoadSetting.Boundary b) {
                assertEquals(b.factor() * textbookBoundaryLoad(s, c.vinV()), c.nominalIoutA(), 1e-9 * c.nominalIoutA());
                ConductionMode expected = b.factor() < 1 ? ConductionMode.DCM : ConductionMode.CCM;
                assertEquals(expected, resolved.get(i).point().mode(), c.label());
            }
        }
        assertEquals(List.of(0.5, EnvelopeCorners.DCM_SIDE, EnvelopeCorners.CCM_SIDE, 4.0),
                corners.subList(0, 4).stream().map(c -> c.load() instanceof LoadSetting.Boundary b ? b.factor()
                        : c.nominalIoutA()).toList());
    }

    @Test
    void boundaryCornersFollowTheBoundaryWhenTheInductanceMoves() {
        StageSpec nominal = idealSwitchStage(60e-6);
        StageSpec smaller = nominal.withLm(50e-6);
        ControlSpec control = ControlSpec.voltageMode(1.8, 0.7);
        LoadSetting ccmSide = new LoadSetting.Boundary(EnvelopeCorners.CCM_SIDE);
        double i = ccmSide.ioutA(new OperatingPointSolver(smaller, control), 36, smaller.iout());
        // the boundary load scales as 1/Lm (Ls in the denominator of the textbook boundary)
        assertEquals(EnvelopeCorners.CCM_SIDE * textbookBoundaryLoad(nominal, 36) * 1.2, i, 1e-9 * i);
        // and a boundary pushed out of the load range stops at its end
        StageSpec larger = nominal.withLm(120e-6);
        assertEquals(0.5, new LoadSetting.Boundary(EnvelopeCorners.DCM_SIDE)
                .ioutA(new OperatingPointSolver(larger, control), 36, larger.iout()));
    }

    @Test
    void aStageInDcmAtFullLoadHasNoBoundaryCorners() {
        DesignRequest r = EnvelopeCases.dcm(EnvelopeCases.opamp(2));
        List<EnvelopeCorner> corners = EnvelopeCorners.of(r.stage(), r.control(), r.feedback());
        assertEquals(4, corners.size());
        assertTrue(corners.stream().noneMatch(EnvelopeCorner::nearBoundary));
    }

    @Test
    void shuntOptoCornersComeAtBothCtrExtremesAndCollapseWithoutThem() {
        DesignRequest r = EnvelopeCases.dcm(EnvelopeCases.shuntOpto(0.5, 1.6, 8e3));
        List<EnvelopeCorner> corners = EnvelopeCorners.of(r.stage(), r.control(), r.feedback());
        assertEquals(8, corners.size());
        assertEquals(List.of(0.5, 1.6), corners.subList(0, 2).stream().map(EnvelopeCorner::ctr).toList());
        assertTrue(corners.get(1).label().endsWith("ctr=160 %"), corners.get(1).label());
        List<EnvelopeCorner> bare = EnvelopeCorners.withoutCtr(corners);
        assertEquals(4, bare.size());
        assertTrue(bare.stream().allMatch(c -> Double.isNaN(c.ctr())));
    }

    @Test
    void labelsNameLineLoadAndBoundary() {
        StageSpec s = idealSwitchStage(60e-6);
        List<EnvelopeCorner> corners = EnvelopeCorners.of(s, ControlSpec.voltageMode(1.8, 0.7), EnvelopeCases.opamp(3));
        assertEquals("vin=36 V, iout=0.5 A", corners.get(0).label());
        assertTrue(corners.get(1).label().startsWith("vin=36 V, iout=0.98×boundary ("), corners.get(1).label());
    }
}
