package org.rosetra.runtime.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

/** Invariants that hold for every unit and dimension, checked on generated inputs. */
class UnitPropertiesTest {

    @Provide
    Arbitrary<String> symbols() {
        return Arbitraries.of(Units.symbols());
    }

    @Provide
    Arbitrary<Dimension> dimensions() {
        return Arbitraries.of(Dimension.namedDimensions().values());
    }

    @Property
    void fromSiInvertsToSi(@ForAll("symbols") String symbol, @ForAll @DoubleRange(min = -1e6, max = 1e6) double value) {
        // round trip: an affine map v -> (v + offset) * scale is inverted by si / scale - offset (from memory)
        Unit unit = Units.find(symbol).orElseThrow();
        double tolerance = 1e-12 * (Math.abs(value) + Math.abs(unit.offset()) + 1.0);
        assertEquals(value, unit.fromSi(unit.toSi(value)), tolerance);
    }

    @Property
    void parsedSymbolIsTheTableEntry(@ForAll("symbols") String symbol) {
        // the parser reads every table symbol back as itself
        assertEquals(Units.find(symbol).orElseThrow(), UnitParser.parse(symbol));
    }

    @Property
    void quotientUndoesProduct(@ForAll("dimensions") Dimension a, @ForAll("dimensions") Dimension b) {
        // group laws of exponent addition (from memory): (a*b)/b = a, a*b = b*a
        assertEquals(a, a.times(b).over(b));
        assertEquals(a.times(b), b.times(a));
    }

    @Property
    void rationalPowersCompose(@ForAll("dimensions") Dimension a,
                               @ForAll @IntRange(min = -6, max = 6) int p,
                               @ForAll @IntRange(min = 1, max = 6) int q) {
        // (a^(p/q))^(q/p) = a for p != 0, and (a^(1/q))^q = a (from memory: exponent rules)
        Rational power = Rational.of(p, q);
        if (p != 0) {
            assertEquals(a, a.pow(power).pow(Rational.of(q, p)));
        }
        assertEquals(a, a.pow(Rational.of(1, q)).pow(q));
    }

    @Property
    void compoundScaleIsProductOfScales(@ForAll("symbols") String left, @ForAll("symbols") String right) {
        // a compound's factor to SI is the product/quotient of its parts' factors; offsets drop (common practice)
        Unit a = Units.find(left).orElseThrow();
        Unit b = Units.find(right).orElseThrow();
        Unit product = UnitParser.parse(left + "*" + right);
        Unit quotient = UnitParser.parse(left + "/" + right);
        assertEquals(a.scale() * b.scale(), product.scale(), 1e-15 * product.scale());
        assertEquals(a.scale() / b.scale(), quotient.scale(), 1e-15 * quotient.scale());
        assertEquals(0.0, product.offset());
        assertEquals(a.dimension().over(b.dimension()), quotient.dimension());
    }
}
