package org.rosetra.lang.kernel;

import java.util.Objects;

/** What is known about the name under the cursor; {@code found} is false when nothing is. */
public record InspectionResult(boolean found, MimeBundle documentation) {
    public InspectionResult {
        Objects.requireNonNull(documentation, "documentation");
    }

    public static InspectionResult notFound() {
        return new InspectionResult(false, MimeBundle.empty());
    }

    public static InspectionResult of(MimeBundle documentation) {
        return new InspectionResult(true, documentation);
    }
}
