package org.flyloop.averaged;

import java.util.Locale;
import org.flyloop.spec.ControlScheme;
import org.flyloop.spec.ControlSpec;
import org.flyloop.spec.StageSpec;

/**
 * Writes the averaged flyback at one operating point as a SPICE netlist that {@code ngspice -b}
 * runs as written: the same equations as {@link AveragedSwitchNetwork}, secondary-referred, with
 * behavioural sources (B elements) for the averaged switch network, the DC inputs at their
 * operating values, an AC source of 1 on one input, an {@code .ac} sweep and a {@code .control}
 * block that writes the operating point and the sweep with {@code wrdata}.
 *
 * <p>Nodes: {@code vg} = Vin/N; {@code nd} duty; {@code nd2} = d2; {@code non} = on-interval
 * current i_on (a voltage node carrying amperes); {@code nl} the averaged inductor voltage feeding
 * Ls; {@code out} the output node; {@code nc} the capacitor behind the ESR. The current through
 * the zero-volt source {@code Vil} is iL. In peak current mode, {@code nvc} is the comparator
 * voltage and the duty node is pinned by a behavioural current source whose only solution is the
 * averaged peak-current relation f(d) = 0 of {@link PeakCurrentDutySolver} (a 1 TΩ resistor gives
 * the node a DC path and shifts f by under 1e-12 A per volt); {@code .nodeset} starts ngspice's
 * Newton at our root. No other resistor is added: every node has a DC path through a source.
 *
 * <p>Files written by the netlist (relative to ngspice's working directory):
 * {@code <base>_op.txt} (one row: v(out), i(vil), v(nd), v(nd2)) and {@code <base>_ac.txt}
 * (columns frequency, then real and imaginary parts of v(out) and i(vil)); both with a header row.
 */
public final class SpiceNetlistWriter {

    private static final double DUTY_NODE_LEAK_OHM = 1e12;

    private final StageSpec stage;
    private final ControlSpec control;

    public SpiceNetlistWriter(StageSpec stage, ControlSpec control) {
        this.stage = stage;
        this.control = AveragedFlybackModel.effectiveControl(stage, control);
    }

    /** Netlist with the AC source on the control input. */
    public String write(Equilibrium op, AcSweep sweep, String outputBaseName) {
        return write(op, sweep, AveragedInputs.CONTROL, outputBaseName);
    }

    /**
     * Netlist with the AC source of magnitude 1 on input {@code acInput}
     * ({@link AveragedInputs#CONTROL}, {@link AveragedInputs#VIN} or {@link AveragedInputs#ISTEP}).
     */
    public String write(Equilibrium op, AcSweep sweep, int acInput, String outputBaseName) {
        if (!outputBaseName.matches("[A-Za-z0-9_.-]+")) {
            throw new IllegalArgumentException("output base name must be a plain file name: " + outputBaseName);
        }
        double n = stage.turns();
        double ls = stage.secondaryInductance();
        double ts = stage.periodS();
        double rds = stage.switchResistance() / (n * n);
        double vf = stage.rectifierDrop();
        AveragedInputs u = op.inputs();
        SwitchCycle c = op.cycle();
        boolean currentMode = control.scheme() == ControlScheme.CURRENT;
        String ipk = "(v(vg)*v(nd)*" + num(ts) + "/(" + num(ls) + "+" + num(rds) + "*v(nd)*" + num(ts) + "/2))";
        String von = "(v(vg)-" + num(rds) + "*v(non))";

        StringBuilder sb = new StringBuilder();
        sb.append("* flyloop averaged flyback, secondary-referred (Ls = Lm/N^2, Vg' = Vin/N, Rds' = Rds/N^2)\n");
        sb.append(String.format(Locale.ROOT, "* operating point: Vin %.6g V, control %.9g, mode %s, d %.9g, d2 %.9g,"
                + " Vout %.9g V%n", u.vinV(), u.control(), c.mode().label(), c.duty(), c.duty2(), c.outputVoltageV()));
        sb.append("Vvg vg 0 DC ").append(num(u.vinV() / n)).append(ac(acInput == AveragedInputs.VIN, 1 / n))
                .append('\n');
        if (currentMode) {
            sb.append("Vvc nvc 0 DC ").append(num(u.control())).append(ac(acInput == AveragedInputs.CONTROL, 1))
                    .append('\n');
            String commanded = "(" + num(n / control.senseVPerA()) + "*(v(nvc)-" + num(control.slopeVPerS())
                    + "*v(nd)*" + num(ts) + "))";
            String base = "(i(Vil)+" + von + "*v(nd)*" + num(ts / (2 * ls)) + ")";
            String offEq = "(((v(out)+" + num(vf) + ")*(1-v(nd))-" + von + "*v(nd))*(1-v(nd))*" + num(ts / (2 * ls))
                    + ")";
            String q = "((2*i(Vil)-" + ipk + ")/" + ipk + ")";
            double beta = PeakCurrentDutySolver.BLEND_DEPTH;
            sb.append("* CCM depth q and the blend weight of the off-equilibrium peak term\n");
            sb.append("Bq nq 0 V = ").append(q).append('\n');
            sb.append("Blam nlam 0 V = v(nq) <= 0 ? 0 : (v(nq) >= ").append(num(beta)).append(" ? 1 : (v(nq)/")
                    .append(num(beta)).append(")*(v(nq)/").append(num(beta)).append(")*(3-2*v(nq)/")
                    .append(num(beta)).append("))\n");
            sb.append("* duty node: averaged peak of the waveform equals the commanded peak\n");
            sb.append("Bduty 0 nd I = (v(nq) < 0 ? ").append(ipk).append(" : ").append(base).append("+v(nlam)*")
                    .append(offEq).append(")-").append(commanded).append('\n');
            sb.append("Rleak nd 0 ").append(num(DUTY_NODE_LEAK_OHM)).append('\n');
        } else {
            sb.append("Vd nd 0 DC ").append(num(u.control())).append(ac(acInput == AveragedInputs.CONTROL, 1))
                    .append('\n');
        }
        sb.append("* demagnetizing fraction d2 = clamp(2 iL / i_pk,DCM - d, 0, 1 - d)\n");
        sb.append("Bd2 nd2 0 V = min(max(2*i(Vil)/").append(ipk).append("-v(nd), 0), 1-v(nd))\n");
        sb.append("* on-interval average current iL/(d + d2)\n");
        sb.append("Bon non 0 V = i(Vil)/(v(nd)+v(nd2))\n");
        sb.append("* averaged magnetizing voltage d*v_on - d2*(v_o + Vf)\n");
        sb.append("Bvl nl 0 V = v(nd)*").append(von).append("-v(nd2)*(v(out)+").append(num(vf)).append(")\n");
        sb.append("Lm nl nli ").append(num(ls)).append('\n');
        sb.append("Vil nli 0 DC 0\n");
        sb.append("* averaged rectifier current iL*d2/(d + d2) into the output node\n");
        sb.append("Brect 0 out I = i(Vil)*v(nd2)/(v(nd)+v(nd2))\n");
        if (stage.esr() > 0) {
            sb.append("Resr out nc ").append(num(stage.esr())).append('\n');
            sb.append("Cout nc 0 ").append(num(stage.cout())).append('\n');
        } else {
            sb.append("Cout out 0 ").append(num(stage.cout())).append('\n');
        }
        if (Double.isFinite(op.loadResistanceOhm())) {
            sb.append("Rload out 0 ").append(num(op.loadResistanceOhm())).append('\n');
        }
        sb.append("Istep out 0 DC ").append(num(u.iStepA())).append(ac(acInput == AveragedInputs.ISTEP, 1))
                .append('\n');
        sb.append(".nodeset v(out)=").append(num(c.outputVoltageV())).append(" v(nd)=").append(num(c.duty()))
                .append(" v(nd2)=").append(num(c.duty2())).append(" v(non)=").append(num(c.onCurrentA()));
        if (stage.esr() > 0) {
            sb.append(" v(nc)=").append(num(op.state()[1]));
        }
        sb.append('\n');
        sb.append(String.format(Locale.ROOT, ".ac dec %d %s %s%n", sweep.pointsPerDecade(), num(sweep.startHz()),
                num(sweep.stopHz())));
        sb.append(".control\n");
        sb.append("set wr_singlescale\n");
        sb.append("set wr_vecnames\n");
        sb.append("op\n");
        sb.append("wrdata ").append(outputBaseName).append("_op.txt v(out) i(vil) v(nd) v(nd2)\n");
        sb.append("run\n");
        sb.append("wrdata ").append(outputBaseName).append("_ac.txt v(out) i(vil)\n");
        sb.append("quit\n");
        sb.append(".endc\n");
        sb.append(".end\n");
        return sb.toString();
    }

    private static String ac(boolean on, double magnitude) {
        return on ? " AC " + num(magnitude) : "";
    }

    private static String num(double v) {
        return String.format(Locale.ROOT, "%.17g", v).replaceFirst("\\.?0+(e|$)", "$1");
    }
}
