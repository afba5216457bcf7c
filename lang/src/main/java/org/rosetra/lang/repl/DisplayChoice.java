package org.rosetra.lang.repl;

import java.util.List;
import org.rosetra.lang.syntax.Display;
import org.rosetra.runtime.units.DisplayUnits;
import org.rosetra.runtime.units.Unit;
import org.rosetra.runtime.units.UnitParser;

/**
 * The display units a session's {@code display} statements choose, SI by default. Mirrors the
 * rule the record's tables follow, so a value shown in the REPL reads like the same value in a table.
 */
final class DisplayChoice {
    private DisplayChoice() {
    }

    static DisplayUnits of(List<Display> displays) {
        DisplayUnits units = DisplayUnits.si();
        for (Display d : displays) {
            if (d.isUnitSet()) {
                units = d.subject().text().equals("us") ? DisplayUnits.us() : DisplayUnits.si();
                continue;
            }
            Unit unit = UnitParser.parse(d.unitText());
            units = d.subject().text().equals("strain") ? units.withStrainUnit(unit) : units.with(unit.dimension(), unit);
        }
        return units;
    }
}
