package org.rosetra.runtime.chain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.rosetra.runtime.gauge.ArmCorrection;
import org.rosetra.runtime.gauge.Bridge;
import org.rosetra.runtime.gauge.Gauge;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.results.RosetteMember;
import org.rosetra.runtime.results.RosetteResult;
import org.rosetra.runtime.rosette.RosetteLayout;
import org.rosetra.runtime.rosette.RosetteSolver;
import org.rosetra.runtime.strain.StrainState;
import org.rosetra.runtime.stress.PlaneCondition;

/**
 * Handbook stress states pushed through the whole chain: stresses to strains by Hooke's law,
 * to what each arm would indicate (transverse sensitivity, thermal output, lead wires and
 * bridge, all forward), then back through the chain to stresses.
 */
class ReductionChainTest {

    private static final double UE = 1e-6;
    private static final double MPA = 1e6;

    /** Invented structural steel and aluminium alloy, realistic constants. */
    private static final Material STEEL = Material.of("test steel", 200e9, 0.29, null, 355e6, null, null, null);
    private static final Material ALUMINIUM = Material.of("test alloy", 70e9, 0.33, null, null, null, null, null);

    private static final Set<RosetteMember> STRESSES = EnumSet.of(RosetteMember.SIGMA_X, RosetteMember.SIGMA_Y,
            RosetteMember.TAU_XY, RosetteMember.SIGMA_1, RosetteMember.SIGMA_2, RosetteMember.VON_MISES,
            RosetteMember.EPS_Z);

    /** Plane stress Hooke's law, inverted (handbook closed form): eps_x = (s_x - nu s_y)/E, gamma = tau/G. */
    private static StrainState strainsOf(double sx, double sy, double tau, Material m) {
        return new StrainState((sx - m.nu() * sy) / m.e(), (sy - m.nu() * sx) / m.e(), tau * 2 * (1 + m.nu()) / m.e());
    }

    /**
     * What each arm indicates. Forward model, independent of the code under test:
     * the gauge's strain with transverse sensitivity (e(θ) + Kt e(θ+90°))/(1 - nu0 Kt)
     * (Dally & Riley, Experimental Stress Analysis, from memory), plus the thermal output
     * TO(T) F* / F (common practice); then dR/R = F e desensitized by R_g/(R_g + n R_L) (from memory);
     * the quarter bridge's output Vr = x/4 / (1 + x/2) (Wheatstone bridge, common practice),
     * indicated as 4 Vr / F_inst. With bridge none, F e / F_inst.
     */
    private static double[] indications(StrainState s, RosetteLayout layout, double rotation, Gauge g, Bridge bridge,
                                        double leadOhm, double instrumentFactor, double temperatureC,
                                        double[] offsets) {
        double[] out = new double[layout.armCount()];
        for (int i = 0; i < out.length; i++) {
            double t = rotation + layout.angle(i);
            double felt = (s.normalAt(t) + g.transverse() * s.normalAt(t + Math.PI / 2))
                    / (1 - g.nu0() * g.transverse()) + offsets[i];
            if (!Double.isNaN(temperatureC)) {
                felt += g.thermalOutput(temperatureC) * g.thermalFactor() / g.factor();
            }
            double x = g.factor() * felt;
            if (bridge == Bridge.NONE) {
                out[i] = x / instrumentFactor;
            } else {
                x *= g.resistance() / (g.resistance() + bridge.leadsInGaugeArm() * leadOhm);
                double vr = x / 4 / (1 + x / 2);
                out[i] = 4 * vr / instrumentFactor;
            }
        }
        return out;
    }

    private static double[][] columnsOf(double[]... samples) {
        double[][] cols = new double[samples[0].length][samples.length];
        for (int i = 0; i < samples.length; i++) {
            for (int k = 0; k < cols.length; k++) {
                cols[k][i] = samples[i][k];
            }
        }
        return cols;
    }

    @Test
    void thinWalledCylinderUnderInternalPressure() {
        // Handbook closed form (thin-walled cylinder): hoop p r / t, axial p r / (2 t).
        double p = 2.5 * MPA;
        double r = 0.400;
        double t = 0.008;
        double hoop = p * r / t; // 125 MPa
        double axial = p * r / (2 * t); // 62.5 MPa
        // Part's x along the axis, y around the hoop.
        StrainState s = strainsOf(axial, hoop, 0, STEEL);
        Gauge gauge = Gauge.withFactor(2.09).withTransverse(0.006).withResistance(350)
                .withThermal(-21.5 * UE, 2.10 * UE, -0.0430 * UE, 0.000155 * UE);
        RosetteLayout layout = RosetteLayout.rectangular();
        double rotation = Math.toRadians(20);
        double[] offsets = {15 * UE, -7 * UE, 3 * UE}; // invented installation zero offsets
        double[] base = indications(StrainState.ZERO, layout, rotation, gauge, Bridge.QUARTER_3WIRE, 0.8, 2.00, 21.0,
                offsets);
        double[] loaded = indications(s, layout, rotation, gauge, Bridge.QUARTER_3WIRE, 0.8, 2.00, 35.0, offsets);
        ReductionChain chain = ReductionChain.of(gauge, Bridge.QUARTER_3WIRE, 0.8, 2.00, layout, rotation, STEEL,
                PlaneCondition.PLANE_STRESS);
        chain = chain.withZero(chain.correctedBaseline(base, 21.0));
        ChainBuffers out = chain.buffers(4, STRESSES, false);
        chain.run(columnsOf(loaded), new double[] {35.0}, 1, out);
        assertEquals(axial, out.member(RosetteMember.SIGMA_X)[0], 1e-9 * axial);
        assertEquals(hoop, out.member(RosetteMember.SIGMA_Y)[0], 1e-9 * hoop);
        assertEquals(0, out.member(RosetteMember.TAU_XY)[0], 1e-9 * hoop);
        assertEquals(hoop, out.member(RosetteMember.SIGMA_1)[0], 1e-9 * hoop);
        assertEquals(axial, out.member(RosetteMember.SIGMA_2)[0], 1e-9 * hoop);
        // von Mises of (hoop, axial, 0) = 62.5 sqrt(3) MPa (handbook: sqrt(s1^2 - s1 s2 + s2^2)).
        assertEquals(62.5 * MPA * Math.sqrt(3), out.member(RosetteMember.VON_MISES)[0], 1e-9 * hoop);
    }

    @Test
    void zeroWindowMeanIsSubtractedFromEverySample() {
        // Thin-walled cylinder again (handbook: hoop p r / t, axial p r / (2 t)), zeroed by the mean
        // of an unloaded window read at varying temperature (LANGUAGE.md, series zero).
        double hoop = 1.8 * MPA * 0.25 / 0.006;
        double axial = hoop / 2;
        StrainState s = strainsOf(axial, hoop, 0, STEEL);
        Gauge gauge = Gauge.withFactor(2.09).withTransverse(0.006).withResistance(350)
                .withThermal(-21.5 * UE, 2.10 * UE, -0.0430 * UE, 0.000155 * UE);
        RosetteLayout layout = RosetteLayout.rectangular();
        double rotation = Math.toRadians(-40);
        double[] offsets = {-12 * UE, 9 * UE, 4 * UE}; // invented installation zero offsets
        ReductionChain chain = ReductionChain.of(gauge, Bridge.QUARTER_3WIRE, 1.1, 2.00, layout, rotation, STEEL,
                PlaneCondition.PLANE_STRESS);
        int window = 8;
        double[][] unloaded = new double[window][];
        double[] temps = new double[window];
        for (int i = 0; i < window; i++) {
            temps[i] = 18 + i;
            unloaded[i] = indications(StrainState.ZERO, layout, rotation, gauge, Bridge.QUARTER_3WIRE, 1.1, 2.00,
                    temps[i], offsets);
        }
        ChainBuffers buffers = chain.buffers(window, STRESSES, false);
        chain.correctOnly(columnsOf(unloaded), temps, window, buffers);
        double[] mean = new double[3];
        for (int k = 0; k < 3; k++) {
            for (int i = 0; i < window; i++) {
                mean[k] += buffers.corrected(k)[i] / window;
            }
        }
        ReductionChain zeroed = chain.withZero(mean);
        double[] loaded = indications(s, layout, rotation, gauge, Bridge.QUARTER_3WIRE, 1.1, 2.00, 40.0, offsets);
        zeroed.run(columnsOf(loaded, loaded), new double[] {40.0, 40.0}, 2, buffers);
        assertEquals(axial, buffers.member(RosetteMember.SIGMA_X)[1], 1e-9 * hoop);
        assertEquals(hoop, buffers.member(RosetteMember.SIGMA_Y)[1], 1e-9 * hoop);
        assertEquals(0, buffers.member(RosetteMember.TAU_XY)[1], 1e-9 * hoop);
    }

    @Test
    void solidShaftInBendingAndTorsion() {
        // Handbook closed form (solid circular shaft): bending 32 M / (pi d^3), torsion 16 T / (pi d^3).
        double d = 0.040;
        double bendingMoment = 300;
        double torque = 450;
        double sigma = 32 * bendingMoment / (Math.PI * d * d * d);
        double tau = 16 * torque / (Math.PI * d * d * d);
        StrainState s = strainsOf(sigma, 0, tau, ALUMINIUM);
        Gauge gauge = Gauge.withFactor(2.12).withTransverse(-0.011);
        RosetteLayout layout = RosetteLayout.delta();
        double rotation = Math.toRadians(-30);
        double[] zeroOffsets = new double[3];
        double[] ind = indications(s, layout, rotation, gauge, Bridge.NONE, 0, 2.00, Double.NaN, zeroOffsets);
        ReductionChain chain = ReductionChain.of(gauge, Bridge.NONE, 0, 2.00, layout, rotation, ALUMINIUM,
                PlaneCondition.PLANE_STRESS);
        ChainBuffers out = chain.buffers(1, STRESSES, false);
        chain.run(columnsOf(ind), null, 1, out);
        assertEquals(sigma, out.member(RosetteMember.SIGMA_X)[0], 1e-9 * sigma);
        assertEquals(0, out.member(RosetteMember.SIGMA_Y)[0], 1e-9 * sigma);
        assertEquals(tau, out.member(RosetteMember.TAU_XY)[0], 1e-9 * sigma);
        // Handbook (combined bending and torsion): s1,2 = s/2 +- sqrt(s^2/4 + t^2), von Mises sqrt(s^2 + 3 t^2).
        double radius = Math.sqrt(sigma * sigma / 4 + tau * tau);
        assertEquals(sigma / 2 + radius, out.member(RosetteMember.SIGMA_1)[0], 1e-9 * sigma);
        assertEquals(sigma / 2 - radius, out.member(RosetteMember.SIGMA_2)[0], 1e-9 * sigma);
        assertEquals(Math.sqrt(sigma * sigma + 3 * tau * tau), out.member(RosetteMember.VON_MISES)[0], 1e-9 * sigma);
    }

    @Test
    void beamInBendingWithFourArmsAndATwoWireBridge() {
        // Handbook closed form (beam in bending): s = M c / I, rectangular section I = b h^3 / 12.
        double b = 0.030;
        double h = 0.060;
        double moment = 2000;
        double sigma = moment * (h / 2) / (b * h * h * h / 12);
        StrainState s = strainsOf(sigma, 0, 0, STEEL);
        Gauge gauge = Gauge.withFactor(2.05).withTransverse(0.004);
        RosetteLayout layout = RosetteLayout.armsDegrees(0, 45, 90, 135);
        double rotation = Math.toRadians(10);
        double[] ind = indications(s, layout, rotation, gauge, Bridge.QUARTER, 0.3, 2.05, Double.NaN, new double[4]);
        ReductionChain chain = ReductionChain.of(gauge, Bridge.QUARTER, 0.3, 2.05, layout, rotation, STEEL,
                PlaneCondition.PLANE_STRESS);
        ChainBuffers out = chain.buffers(1, STRESSES, true);
        chain.run(columnsOf(ind), null, 1, out);
        assertEquals(sigma, out.member(RosetteMember.SIGMA_X)[0], 1e-9 * sigma);
        assertEquals(0, out.member(RosetteMember.SIGMA_Y)[0], 1e-9 * sigma);
        assertEquals(sigma, out.member(RosetteMember.VON_MISES)[0], 1e-9 * sigma);
        // Handbook: a uniaxial stress gives eps_y = -nu eps_x.
        assertEquals(-STEEL.nu() * out.epsX()[0], out.epsY()[0], 1e-9 * out.epsX()[0]);
        assertEquals(0, out.residualRms()[0], 1e-9 * UE);
    }

    @Test
    void columnsAgreeWithTheScalarPath() {
        Gauge gauge = Gauge.withFactor(2.09).withTransverse(0.006).withResistance(350)
                .withThermal(-21.5 * UE, 2.10 * UE, -0.0430 * UE, 0.000155 * UE);
        ArmCorrection arm = new ArmCorrection(gauge, Bridge.QUARTER_3WIRE, 0.8, 2.00);
        RosetteSolver solver = new RosetteSolver(RosetteLayout.rectangular(), 0.2, 0.006, 0.285);
        ReductionChain chain = new ReductionChain(new ArmCorrection[] {arm, arm, arm}, solver, STEEL,
                PlaneCondition.PLANE_STRESS).withZero(4 * UE, -2 * UE, 1 * UE);
        int n = 300;
        double[][] ind = new double[3][n];
        double[] temp = new double[n];
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < 3; k++) {
                ind[k][i] = Math.cos(0.05 * i + 2 * k) * (600 + 100 * k) * UE;
            }
            temp[i] = 10 + 0.1 * i;
        }
        ChainBuffers out = chain.buffers(n, EnumSet.allOf(RosetteMember.class), false);
        chain.run(ind, temp, n, out);
        double[] zero = {4 * UE, -2 * UE, 1 * UE};
        for (int i = 0; i < n; i++) {
            double[] r = new double[3];
            for (int k = 0; k < 3; k++) {
                r[k] = arm.correct(ind[k][i], temp[i]) - zero[k];
            }
            RosetteResult one = RosetteResult.of(solver.solve(r).state(), STEEL, PlaneCondition.PLANE_STRESS);
            for (RosetteMember m : RosetteMember.values()) {
                assertEquals(one.get(m), out.member(m)[i], 1e-12 * Math.max(1, Math.abs(one.get(m))), m + " at " + i);
            }
        }
    }

    @Test
    void misfitsAreRefused() {
        Gauge gauge = Gauge.withFactor(2.0).withTransverse(0.01);
        ArmCorrection arm = ArmCorrection.atGaugeFactor(gauge, Bridge.NONE, 0);
        RosetteSolver noTransverse = new RosetteSolver(RosetteLayout.rectangular(), 0, 0, 0.285);
        ChainException kt = assertThrows(ChainException.class,
                () -> new ReductionChain(new ArmCorrection[] {arm, arm, arm}, noTransverse, null, null));
        assertTrue(kt.getMessage().contains("Kt"), kt.getMessage());
        RosetteSolver solver = new RosetteSolver(RosetteLayout.rectangular(), 0, 0.01, 0.285);
        assertThrows(ChainException.class, () -> new ReductionChain(new ArmCorrection[] {arm, arm}, solver, null, null));
        ReductionChain strainsOnly = new ReductionChain(new ArmCorrection[] {arm, arm, arm}, solver, null, null);
        ChainBuffers wantsStress = strainsOnly.buffers(2, EnumSet.of(RosetteMember.VON_MISES), false);
        ChainException material = assertThrows(ChainException.class,
                () -> strainsOnly.run(new double[3][2], null, 2, wantsStress));
        assertTrue(material.getMessage().contains("von_mises"), material.getMessage());
        assertThrows(ChainException.class, () -> strainsOnly.withZero(0, Double.NaN, 0));
        ChainBuffers small = strainsOnly.buffers(1, EnumSet.noneOf(RosetteMember.class), false);
        assertThrows(ChainException.class, () -> strainsOnly.run(new double[3][2], null, 2, small));
    }
}
