package org.rosetra.runtime.render.plot;

/** A thinned series: the kept samples' times and values, in time order. */
public record Decimated(double[] time, double[] value) {

  public Decimated {
    if (time.length != value.length) {
      throw new IllegalArgumentException("times and values differ in length");
    }
    time = time.clone();
    value = value.clone();
  }

  @Override
  public double[] time() {
    return time.clone();
  }

  @Override
  public double[] value() {
    return value.clone();
  }

  public int size() {
    return time.length;
  }
}
