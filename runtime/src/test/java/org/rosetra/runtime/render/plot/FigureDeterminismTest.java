package org.rosetra.runtime.render.plot;

import static java.nio.charset.StandardCharsets.ISO_8859_1;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.ByteBuffer;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class FigureDeterminismTest {

  @Test
  void everyFigureRendersToIdenticalBytesTwice() {
    List<RenderedFigure> first = PlotSamples.all();
    List<RenderedFigure> second = PlotSamples.all();
    for (int i = 0; i < first.size(); i++) {
      assertArrayEquals(first.get(i).svg(), second.get(i).svg(), first.get(i).name() + ".svg");
      assertArrayEquals(first.get(i).png(), second.get(i).png(), first.get(i).name() + ".png");
    }
  }

  @Test
  void svgCarriesNoFontNoTextElementNoHashedIdsNoNaN() {
    for (RenderedFigure f : PlotSamples.all()) {
      String svg = f.svgText();
      assertFalse(svg.contains("<text"), f.name() + ": text must be drawn as outlines");
      assertFalse(svg.contains("font-family"), f.name());
      assertFalse(svg.contains("NaN"), f.name());
      assertFalse(svg.matches("(?s).*id=\"clip-?\\d{5,}\".*"), f.name() + ": clip ids are numbered");
      assertFalse(svg.matches("(?s).*\\d\\.\\d{4,}.*"), f.name() + ": at most three decimals");
    }
  }

  @Test
  void theFontIsOursNotTheHosts() {
    assertTrue(PlotFont.isEmbedded(), "plot font loaded from a file on the class path, got " + PlotFont.familyName());
  }

  @Test
  void pngHasFixedSizeAndResolutionAndNoTimeOrTextChunks() {
    RenderedFigure f = PlotSamples.mohr().render("mohr-lug_fe");
    List<String> chunks = chunkTypes(f.png());
    // PNG specification (W3C/ISO 15948): pHYs holds the resolution, tIME a timestamp,
    // tEXt/iTXt/zTXt free text; we want only the first.
    assertTrue(chunks.contains("pHYs"));
    assertFalse(chunks.contains("tIME"));
    assertFalse(chunks.contains("tEXt") || chunks.contains("iTXt") || chunks.contains("zTXt"));
    ByteBuffer b = ByteBuffer.wrap(f.png());
    assertEquals(f.width() * PngEncoder.SCALE, b.getInt(16)); // IHDR width
    assertEquals(f.height() * PngEncoder.SCALE, b.getInt(20)); // IHDR height
  }

  private static List<String> chunkTypes(byte[] png) {
    List<String> types = new ArrayList<>();
    ByteBuffer b = ByteBuffer.wrap(png);
    int pos = 8; // after the signature
    while (pos + 8 <= png.length) {
      int length = b.getInt(pos);
      types.add(new String(png, pos + 4, 4, ISO_8859_1));
      pos += 12 + length;
    }
    return types;
  }
}
