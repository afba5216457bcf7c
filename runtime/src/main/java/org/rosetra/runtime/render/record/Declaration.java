package org.rosetra.runtime.render.record;

import java.util.List;
import java.util.Objects;

/** A declared material, gauge, rosette or state: its kind, its name and its properties. */
public record Declaration(String kind, String name, List<Property> properties) {

  public Declaration {
    Objects.requireNonNull(kind, "kind");
    Objects.requireNonNull(name, "name");
    properties = List.copyOf(properties);
  }
}
