package org.rosetra.lang.java;

import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.rosetra.lang.syntax.JavaCode;
import org.rosetra.lang.syntax.SourceSpan;

/**
 * The one JShell expression a function's body becomes: an object whose method
 * {@code call(double ...)} holds the body as written, reached through the JDK's
 * {@code ToDoubleFunction<double[]>} so the host can call it without knowing the class. Knows
 * the way back from a place in the generated text to the script, so the compiler's complaints
 * point at the user's own line.
 */
final class GeneratedSource {
    private static final int JAVA_AND_BRACE = "java {".length();

    private final String text;
    private final int bodyStart;
    private final JavaCode code;

    private GeneratedSource(String text, int bodyStart, JavaCode code) {
        this.text = text;
        this.bodyStart = bodyStart;
        this.code = code;
    }

    /**
     * A body without a semicolon is taken as one expression ({@code java { x * 2 }}), else as
     * the statements of a method that returns a double.
     */
    static GeneratedSource of(List<String> parameters, JavaCode code) {
        StringBuilder head = new StringBuilder("new java.util.function.ToDoubleFunction<double[]>() {\n")
                .append("    public double applyAsDouble(double[] a) {\n        return call(");
        for (int i = 0; i < parameters.size(); i++) {
            head.append(i > 0 ? ", " : "").append("a[").append(i).append(']');
        }
        head.append(");\n    }\n    double call(");
        for (int i = 0; i < parameters.size(); i++) {
            head.append(i > 0 ? ", " : "").append("double ").append(parameters.get(i));
        }
        head.append(") {\n");
        boolean expression = !code.source().contains(";");
        if (expression) {
            head.append("return (");
        }
        int bodyStart = head.length();
        String tail = (expression ? ");" : "") + "\n    }\n}\n";
        return new GeneratedSource(head + code.source() + tail, bodyStart, code);
    }

    String text() {
        return text;
    }

    /** The place in the script of a position in the generated text (clamped to the body). */
    SourceSpan spanAt(long position) {
        String body = code.source();
        int offset = (int) Math.max(0, Math.min(body.length(), position - bodyStart));
        int lineStart = body.lastIndexOf('\n', offset - 1) + 1;
        int lines = (int) body.substring(0, lineStart).chars().filter(c -> c == '\n').count();
        SourceSpan at = code.span();
        int line = at.line() + lines;
        int column = lines > 0 ? offset - lineStart + 1 : firstBodyColumn() + offset;
        return new SourceSpan(at.file(), line, column, line, column + 1);
    }

    /** Where {@code word} first appears in the body as a whole word, else the whole block. */
    SourceSpan spanOfWord(String word) {
        Matcher m = Pattern.compile("\\b" + Pattern.quote(word) + "\\b").matcher(code.source());
        return m.find() ? spanAt(bodyStart + m.start()) : code.span();
    }

    /** The column of the body's first character: exact for a one-line block, else after "java {". */
    private int firstBodyColumn() {
        SourceSpan at = code.span();
        if (at.endLine() == at.line()) {
            return at.endColumn() - 1 - code.source().length();
        }
        return at.column() + JAVA_AND_BRACE;
    }
}
