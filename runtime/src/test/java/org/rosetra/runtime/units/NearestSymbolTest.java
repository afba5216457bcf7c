package org.rosetra.runtime.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class NearestSymbolTest {

    @Test
    void levenshteinDistanceOfClassicPairs() {
        // Levenshtein distance, classic examples (from memory): kitten/sitting = 3, flaw/lawn = 2
        assertEquals(3, NearestSymbol.editDistance("kitten", "sitting"));
        assertEquals(2, NearestSymbol.editDistance("flaw", "lawn"));
        assertEquals(0, NearestSymbol.editDistance("MPa", "MPa"));
        assertEquals(3, NearestSymbol.editDistance("", "abc"));
    }

    @Test
    void caseOnlyDifferenceWinsOverCloserSpelling() {
        List<String> known = List.of("kPa", "MPa", "Pa");
        assertEquals("MPa", NearestSymbol.to("mpa", known).orElseThrow());
        assertEquals("kPa", NearestSymbol.to("KPA", known).orElseThrow());
    }

    @Test
    void distantWordsGetNoSuggestion() {
        assertTrue(NearestSymbol.to("xyz", Units.symbols()).isEmpty());
        assertEquals("kip", NearestSymbol.to("kipp", Units.symbols()).orElseThrow());
    }
}
