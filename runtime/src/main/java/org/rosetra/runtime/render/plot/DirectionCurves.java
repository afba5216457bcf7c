package org.rosetra.runtime.render.plot;

import java.util.Objects;

/**
 * Normal and shear strain against direction θ, 0 to 180 degrees counter-clockwise from the
 * part's x-axis, plus each arm's corrected reading at its angle, all in one strain unit.
 */
public record DirectionCurves(
    String title,
    double[] thetaDeg,
    double[] normal,
    double[] shear,
    double[] armAnglesDeg,
    double[] armReadings,
    String unit) {

  public DirectionCurves {
    Objects.requireNonNull(title, "title");
    Objects.requireNonNull(unit, "unit");
    if (thetaDeg.length != normal.length || thetaDeg.length != shear.length || thetaDeg.length < 2) {
      throw new IllegalArgumentException("direction curves '" + title + "' need matching samples");
    }
    if (armAnglesDeg.length != armReadings.length) {
      throw new IllegalArgumentException("direction curves '" + title + "': one reading per arm angle");
    }
    thetaDeg = thetaDeg.clone();
    normal = normal.clone();
    shear = shear.clone();
    armAnglesDeg = armAnglesDeg.clone();
    armReadings = armReadings.clone();
  }

  /**
   * Samples the curves every degree from a strain state by the transformation equations of plane
   * strain (Gere and Goodno, Mechanics of Materials): ε(θ) = (εx+εy)/2 + (εx−εy)/2 cos 2θ +
   * γxy/2 sin 2θ and γ(θ) = −(εx−εy) sin 2θ + γxy cos 2θ.
   */
  public static DirectionCurves fromState(String title, double epsX, double epsY, double gammaXY,
      double[] armAnglesDeg, double[] armReadings, String unit) {
    double[] theta = new double[181];
    double[] eps = new double[181];
    double[] gamma = new double[181];
    for (int i = 0; i <= 180; i++) {
      double t2 = Math.toRadians(2.0 * i);
      theta[i] = i;
      eps[i] = (epsX + epsY) / 2 + (epsX - epsY) / 2 * Math.cos(t2) + gammaXY / 2 * Math.sin(t2);
      gamma[i] = -(epsX - epsY) * Math.sin(t2) + gammaXY * Math.cos(t2);
    }
    return new DirectionCurves(title, theta, eps, gamma, armAnglesDeg, armReadings, unit);
  }

  @Override
  public double[] thetaDeg() {
    return thetaDeg.clone();
  }

  @Override
  public double[] normal() {
    return normal.clone();
  }

  @Override
  public double[] shear() {
    return shear.clone();
  }

  @Override
  public double[] armAnglesDeg() {
    return armAnglesDeg.clone();
  }

  @Override
  public double[] armReadings() {
    return armReadings.clone();
  }
}
