package org.rosetra.lang.check;

import org.rosetra.runtime.units.Dimension;

/**
 * A member of a rosette's (or a state's) result: {@code web_top.sigma_1}. {@code kind} is
 * "strain", "angle" or "stress"; a stress member (and {@code eps_z}) needs a material.
 */
public record BuiltinMember(String name, String kind, Dimension dimension, boolean needsMaterial, String doc) {
}
