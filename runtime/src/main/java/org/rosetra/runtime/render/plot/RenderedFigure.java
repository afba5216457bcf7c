package org.rosetra.runtime.render.plot;

import java.nio.charset.StandardCharsets;
import java.util.Objects;

/**
 * A figure ready to write: its file stem (e.g. {@code mohr-web_top-proof_60kN}) and its SVG and
 * PNG bytes. The files go to {@code plots/STEM.svg} and {@code plots/STEM.png}.
 */
public final class RenderedFigure {

  private final String name;
  private final int width;
  private final int height;
  private final byte[] svg;
  private final byte[] png;

  public RenderedFigure(String name, int width, int height, byte[] svg, byte[] png) {
    this.name = FileStem.require(name);
    this.width = width;
    this.height = height;
    this.svg = Objects.requireNonNull(svg, "svg").clone();
    this.png = Objects.requireNonNull(png, "png").clone();
  }

  public String name() {
    return name;
  }

  /** Size in CSS pixels (the PNG has {@link PngEncoder#SCALE} times as many). */
  public int width() {
    return width;
  }

  public int height() {
    return height;
  }

  public byte[] svg() {
    return svg.clone();
  }

  public String svgText() {
    return new String(svg, StandardCharsets.UTF_8);
  }

  public byte[] png() {
    return png.clone();
  }

  public String svgPath() {
    return "plots/" + name + ".svg";
  }

  public String pngPath() {
    return "plots/" + name + ".png";
  }
}
