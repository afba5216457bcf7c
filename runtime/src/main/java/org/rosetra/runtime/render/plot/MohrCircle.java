package org.rosetra.runtime.render.plot;

import java.util.Objects;

/**
 * Everything one Mohr's circle panel shows, in display units.
 *
 * <p>{@code xFace} is (normal, shear) on the x face: (eps_x, gamma_xy/2) or (sigma_x, tau_xy).
 * {@code yFace} is the y face, whose shear is the negative of the x face's: (eps_y, -gamma_xy/2).
 * {@code twoThetaPDeg} is twice the angle from the x-axis to the first principal direction,
 * counter-clockwise, in degrees. {@code symbol} names the principal values on the plot
 * ({@code ε} gives ε1 and ε2). The constructor checks that the numbers describe one circle, so a
 * plot can never disagree with the tables it illustrates.
 */
public record MohrCircle(
    String title,
    String symbol,
    double centre,
    double radius,
    FacePoint xFace,
    FacePoint yFace,
    double principal1,
    double principal2,
    double twoThetaPDeg,
    String normalAxisLabel,
    String shearAxisLabel) {

  public MohrCircle {
    Objects.requireNonNull(title, "title");
    Objects.requireNonNull(symbol, "symbol");
    Objects.requireNonNull(xFace, "xFace");
    Objects.requireNonNull(yFace, "yFace");
    Objects.requireNonNull(normalAxisLabel, "normalAxisLabel");
    Objects.requireNonNull(shearAxisLabel, "shearAxisLabel");
    double[] all = {centre, radius, principal1, principal2, twoThetaPDeg};
    for (double v : all) {
      if (!Double.isFinite(v)) {
        throw new IllegalArgumentException("Mohr's circle '" + title + "' has a value that is not finite");
      }
    }
    double tol = 1e-6 * (Math.abs(centre) + radius + 1);
    require(radius >= 0, title, "radius is negative");
    require(near(principal1, centre + radius, tol), title, "principal1 is not centre + radius");
    require(near(principal2, centre - radius, tol), title, "principal2 is not centre - radius");
    require(near(Math.hypot(xFace.normal() - centre, xFace.shear()), radius, tol), title,
        "the x face is not on the circle");
    require(near(xFace.normal() + yFace.normal(), 2 * centre, tol)
        && near(xFace.shear() + yFace.shear(), 0, tol), title,
        "the x and y faces are not ends of one diameter");
    if (radius > tol) {
      double angle = Math.toDegrees(Math.atan2(xFace.shear(), xFace.normal() - centre));
      double diff = Math.IEEEremainder(angle - twoThetaPDeg, 360);
      require(Math.abs(diff) < 1e-3, title, "twoThetaP does not point from the x face to principal 1");
    }
  }

  /**
   * The circle of a state given by its x-face and y-face normal values and the x-face shear
   * (gamma_xy/2 or tau_xy); centre, radius, principal values and 2θp follow by the closed form
   * of Mohr's circle (Gere and Goodno, Mechanics of Materials, plane stress and plane strain).
   */
  public static MohrCircle fromComponents(
      String title, String symbol, double normalX, double normalY, double shearXY,
      String normalAxisLabel, String shearAxisLabel) {
    double centre = (normalX + normalY) / 2;
    double half = (normalX - normalY) / 2;
    double radius = Math.hypot(half, shearXY);
    double twoThetaP = radius == 0 ? 0 : Math.toDegrees(Math.atan2(shearXY, half));
    return new MohrCircle(title, symbol, centre, radius, new FacePoint(normalX, shearXY),
        new FacePoint(normalY, -shearXY), centre + radius, centre - radius, twoThetaP,
        normalAxisLabel, shearAxisLabel);
  }

  private static boolean near(double a, double b, double tol) {
    return Math.abs(a - b) <= tol;
  }

  private static void require(boolean ok, String title, String what) {
    if (!ok) {
      throw new IllegalArgumentException("Mohr's circle '" + title + "': " + what);
    }
  }
}
