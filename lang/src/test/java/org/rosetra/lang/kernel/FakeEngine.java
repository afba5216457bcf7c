package org.rosetra.lang.kernel;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.Base64;
import java.util.List;
import javax.imageio.ImageIO;

/**
 * A stand-in for the language session, so the kernel can be tested before the language is
 * wired. Its cells are fixed words, each exercising one kind of output:
 * {@code echo TEXT}, {@code table}, {@code figure}, {@code verdict}, {@code oops},
 * {@code slow oops}, {@code long}, {@code crash}; anything else runs quietly.
 */
final class FakeEngine implements CellEngine {
    static final List<String> NAMES =
            List.of("material", "mohr_circle", "mohr_coulomb", "rosette", "von_mises");

    private volatile boolean interruptRequested;

    @Override
    public CellOutcome execute(String code, OutputSink sink) {
        interruptRequested = false;
        String cell = code.strip();
        if (cell.startsWith("echo ")) {
            sink.printOut(cell.substring(5) + "\n");
            return CellOutcome.nothingToShow();
        }
        switch (cell) {
            case "table" -> {
                sink.display(MimeBundle.plain("case   eps_1\nproof  412 ue")
                        .with("text/html", "<table><tr><th>case</th><th>eps_1</th></tr>"
                                + "<tr><td>proof</td><td>412 ue</td></tr></table>"));
                return CellOutcome.nothingToShow();
            }
            case "figure" -> {
                sink.display(MimeBundle.plain("<Mohr's circle of case proof>")
                        .with("image/svg+xml", "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"10\""
                                + " height=\"10\"><circle cx=\"5\" cy=\"5\" r=\"4\"/></svg>")
                        .with("image/png", tinyPng()));
                return CellOutcome.nothingToShow();
            }
            case "verdict" -> {
                return CellOutcome.shows(MimeBundle.plain("web_top: utilization 0.62, passes")
                        .with("text/markdown", "**web_top**: utilization 0.62, *passes*"));
            }
            case "oops" -> {
                return unknownName();
            }
            case "slow oops" -> {
                pause(300);
                return unknownName();
            }
            case "long" -> {
                return longCell(sink);
            }
            case "crash" -> throw new IllegalStateException("the fake engine breaks on purpose");
            default -> {
                return cell.isEmpty() ? CellOutcome.nothingToShow()
                        : CellOutcome.shows(MimeBundle.plain(cell));
            }
        }
    }

    @Override
    public CompletionResult complete(String code, int cursorPos) {
        int offset = code.offsetByCodePoints(0, cursorPos);
        int start = offset;
        while (start > 0 && isNamePart(code.charAt(start - 1))) {
            start--;
        }
        String prefix = code.substring(start, offset);
        List<String> matches = NAMES.stream().filter(name -> name.startsWith(prefix)).toList();
        return new CompletionResult(matches, code.codePointCount(0, start), cursorPos);
    }

    @Override
    public InspectionResult inspect(String code, int cursorPos, int detailLevel) {
        String word = wordAt(code, code.offsetByCodePoints(0, cursorPos));
        if (!NAMES.contains(word)) {
            return InspectionResult.notFound();
        }
        String text = word + ": a built-in of the fake engine" + (detailLevel > 0 ? " (in detail)" : "");
        return InspectionResult.of(MimeBundle.plain(text).with("text/markdown", "`" + word + "`"));
    }

    @Override
    public Completeness isComplete(String code) {
        int depth = 0;
        for (char c : code.toCharArray()) {
            depth += c == '{' ? 1 : c == '}' ? -1 : 0;
            if (depth < 0) {
                return Completeness.invalid();
            }
        }
        return depth > 0 ? Completeness.incomplete("  ".repeat(depth)) : Completeness.complete();
    }

    @Override
    public void interrupt() {
        interruptRequested = true;
    }

    @Override
    public String languageVersion() {
        return "0.1.0";
    }

    /** Stands for a big series read: works in small steps and looks at the flag between them. */
    private CellOutcome longCell(OutputSink sink) {
        sink.printOut("reading a long series\n");
        for (int step = 0; step < 6000; step++) {
            if (interruptRequested) {
                return CellOutcome.failed("Interrupted", "the cell was stopped on request",
                        List.of("Interrupted: the cell was stopped on request at step " + step));
            }
            pause(10);
        }
        return CellOutcome.shows(MimeBundle.plain("finished"));
    }

    private static CellOutcome unknownName() {
        return CellOutcome.failed("NameError", "no material named s999",
                List.of("cell 1, line 1, column 12: no material named s999",
                        "  material = s999",
                        "             ^^^^",
                        "hint: declare it with material s999 { ... }"));
    }

    private static String wordAt(String code, int offset) {
        int start = offset;
        int end = offset;
        while (start > 0 && isNamePart(code.charAt(start - 1))) {
            start--;
        }
        while (end < code.length() && isNamePart(code.charAt(end))) {
            end++;
        }
        return code.substring(start, end);
    }

    private static boolean isNamePart(char c) {
        return Character.isLetterOrDigit(c) || c == '_';
    }

    private static void pause(long millis) {
        try {
            Thread.sleep(millis);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private static String tinyPng() {
        BufferedImage image = new BufferedImage(2, 2, BufferedImage.TYPE_INT_RGB);
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try {
            ImageIO.write(image, "png", bytes);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return Base64.getEncoder().encodeToString(bytes.toByteArray());
    }
}
