package org.rosetra.runtime.material;

/**
 * A material that cannot be used as given, or that lacks a property a calculation needs.
 * The message names the material, the property and what to give instead.
 */
public final class MaterialException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public MaterialException(String message) {
        super(message);
    }
}
