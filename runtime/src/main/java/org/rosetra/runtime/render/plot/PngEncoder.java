package org.rosetra.runtime.render.plot;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageTypeSpecifier;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.metadata.IIOInvalidTreeException;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageOutputStream;

/**
 * Writes a {@link Painting} as PNG at twice its CSS size (sharp on paper and on dense screens).
 *
 * <p>Everything that could vary is fixed: an opaque RGB image on white, the rendering hints, and
 * the physical resolution in the pHYs chunk (192 dots per inch, so the image prints at the size
 * of the SVG). The JDK's PNG writer adds no time chunk, so the bytes depend only on the drawing.
 */
public final class PngEncoder {

  /** Device pixels per CSS pixel. */
  public static final int SCALE = 2;

  /** 192 dpi expressed in pixels per metre, as the pHYs chunk wants it. */
  private static final int PIXELS_PER_METRE = 7559;

  private PngEncoder() {}

  public static byte[] encode(Painting painting) {
    BufferedImage image =
        new BufferedImage(
            painting.width() * SCALE, painting.height() * SCALE, BufferedImage.TYPE_INT_RGB);
    Graphics2D g = image.createGraphics();
    try {
      applyHints(g);
      g.setColor(Color.WHITE);
      g.fillRect(0, 0, image.getWidth(), image.getHeight());
      g.scale(SCALE, SCALE);
      painting.paint(g);
    } finally {
      g.dispose();
    }
    return write(image);
  }

  static void applyHints(Graphics2D g) {
    g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
    g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
    g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
    g.setRenderingHint(RenderingHints.KEY_RENDERING, RenderingHints.VALUE_RENDER_QUALITY);
    g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
    g.setRenderingHint(RenderingHints.KEY_COLOR_RENDERING, RenderingHints.VALUE_COLOR_RENDER_QUALITY);
  }

  private static byte[] write(BufferedImage image) {
    ImageWriter writer = ImageIO.getImageWritersByFormatName("png").next();
    try (ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        ImageOutputStream out = ImageIO.createImageOutputStream(bytes)) {
      ImageWriteParam param = writer.getDefaultWriteParam();
      IIOMetadata metadata =
          writer.getDefaultImageMetadata(ImageTypeSpecifier.createFromRenderedImage(image), param);
      addResolution(metadata);
      writer.setOutput(out);
      writer.write(null, new IIOImage(image, null, metadata), param);
      out.flush();
      return bytes.toByteArray();
    } catch (IOException e) {
      throw new UncheckedIOException(e); // an in-memory stream does not fail
    } finally {
      writer.dispose();
    }
  }

  private static void addResolution(IIOMetadata metadata) throws IIOInvalidTreeException {
    IIOMetadataNode phys = new IIOMetadataNode("pHYs");
    phys.setAttribute("pixelsPerUnitXAxis", Integer.toString(PIXELS_PER_METRE));
    phys.setAttribute("pixelsPerUnitYAxis", Integer.toString(PIXELS_PER_METRE));
    phys.setAttribute("unitSpecifier", "meter");
    IIOMetadataNode root = new IIOMetadataNode("javax_imageio_png_1.0");
    root.appendChild(phys);
    metadata.mergeTree("javax_imageio_png_1.0", root);
  }
}
