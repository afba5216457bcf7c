package org.rosetra.runtime.gauge;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class GaugeTest {

    @Test
    void defaultsAreThoseOfLanguageMd() {
        Gauge g = Gauge.withFactor(2.09);
        assertEquals(0.0, g.transverse());
        assertEquals(0.285, g.nu0());
        assertEquals(120.0, g.resistance());
        assertEquals(0, g.thermal().length);
        assertEquals(2.00, g.thermalFactor());
    }

    @Test
    void isImmutable() {
        double[] a = {1e-6, 2e-6};
        Gauge g = Gauge.withFactor(2.0).withThermal(a);
        a[0] = 99;
        g.thermal()[1] = 99;
        assertEquals(1e-6, g.thermal()[0]);
        assertEquals(2e-6, g.thermal()[1]);
        assertEquals(Gauge.withFactor(2.0).withThermal(1e-6, 2e-6), g);
    }

    @Test
    void badFieldsAreRefusedWithAnActionableMessage() {
        GaugeException f = assertThrows(GaugeException.class, () -> Gauge.withFactor(0));
        assertTrue(f.getMessage().contains("gauge factor") && f.getMessage().contains("0.0"), f.getMessage());
        assertThrows(GaugeException.class, () -> Gauge.withFactor(Double.NaN));
        assertThrows(GaugeException.class, () -> Gauge.withFactor(2).withTransverse(1.2));
        // 0.6 typed for 0.6 %: refused rather than taken as Kt = 60 %.
        GaugeException percent = assertThrows(GaugeException.class, () -> Gauge.withFactor(2).withTransverse(0.6));
        assertTrue(percent.getMessage().contains("0.006"), percent.getMessage());
        assertEquals(-0.012, Gauge.withFactor(2).withTransverse(-0.012).transverse());
        assertThrows(GaugeException.class, () -> Gauge.withFactor(2).withTransverse(Double.NaN));
        assertThrows(GaugeException.class, () -> Gauge.withFactor(2).withNu0(0.5));
        assertThrows(GaugeException.class, () -> Gauge.withFactor(2).withResistance(-120));
        GaugeException t = assertThrows(GaugeException.class, () -> Gauge.withFactor(2).withThermal(1e-6, Double.NaN));
        assertTrue(t.getMessage().contains("a1"), t.getMessage());
        assertThrows(GaugeException.class, () -> Gauge.withFactor(2).withThermalFactor(0));
    }
}
