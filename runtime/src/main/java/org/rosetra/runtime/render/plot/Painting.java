package org.rosetra.runtime.render.plot;

import java.awt.Graphics2D;

/** Something that paints itself on a canvas of fixed size, in CSS pixels, with no other effect. */
public interface Painting {

  int width();

  int height();

  /** Paints onto {@code g}, whose origin is the canvas's top-left corner. */
  void paint(Graphics2D g);
}
