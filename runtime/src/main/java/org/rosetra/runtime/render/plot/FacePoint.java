package org.rosetra.runtime.render.plot;

/**
 * The point of one face on Mohr's circle, in display units: the normal value and the shear value
 * acting on that face (half the engineering shear strain for a strain circle, the shear stress
 * for a stress circle), signed as the part's axes define them.
 */
public record FacePoint(double normal, double shear) {

  public FacePoint {
    if (!Double.isFinite(normal) || !Double.isFinite(shear)) {
      throw new IllegalArgumentException("a face point needs finite values, got " + normal + ", " + shear);
    }
  }
}
