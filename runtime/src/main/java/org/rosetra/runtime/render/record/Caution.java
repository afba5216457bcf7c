package org.rosetra.runtime.render.record;

/** The caution every record carries, in our own words, near its top. */
public final class Caution {

  public static final String TEXT =
      "This record supports, and does not replace, the judgment of a qualified engineer. "
          + "The governing code of practice and local regulations decide whether the part is "
          + "acceptable. Check the inputs, the method and the results before relying on them.";

  private Caution() {}
}
