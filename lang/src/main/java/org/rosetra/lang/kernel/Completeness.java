package org.rosetra.lang.kernel;

import java.util.Objects;

/** Whether typed code can run now, needs more lines, can never run, or cannot be told. */
public sealed interface Completeness {

    record Complete() implements Completeness {}

    /** More lines are needed (an open block); {@code indent} is a hint for the next line. */
    record Incomplete(String indent) implements Completeness {
        public Incomplete {
            Objects.requireNonNull(indent, "indent");
        }
    }

    /** The code is wrong whatever follows; a front end runs it so the error shows at once. */
    record Invalid() implements Completeness {}

    record Unknown() implements Completeness {}

    static Completeness complete() {
        return new Complete();
    }

    static Completeness incomplete(String indent) {
        return new Incomplete(indent);
    }

    static Completeness invalid() {
        return new Invalid();
    }

    static Completeness unknown() {
        return new Unknown();
    }
}
