package org.rosetra.runtime.render.plot;

/** A figure: something that paints at a fixed size and can be written as SVG and PNG. */
public interface Figure {

  Painting painting();

  /** Renders the figure to both formats under the given file stem. */
  default RenderedFigure render(String name) {
    Painting p = painting();
    return new RenderedFigure(name, p.width(), p.height(), SvgEncoder.encode(p), PngEncoder.encode(p));
  }
}
