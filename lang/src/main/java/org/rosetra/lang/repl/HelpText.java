package org.rosetra.lang.repl;

/** What {@code :help} prints. */
final class HelpText {
    private HelpText() {
    }

    static final String TEXT = """
            Type statements as in a script; each one is added to this session:
              material s355 { ... }     rosette web_top { ... }     case proof { ... }
              let allowable = s355.yield / 1.5
              check "web yield": web_top.von_mises <= allowable
              table web_top
            Type an expression to see its value in display units:
              web_top.sigma_1[proof]      2 * 3 MPa      max(web_top.von_mises)
            A line that leaves a { or ( open goes on at the next line; two blank lines end it anyway.
            Defining a name again replaces the older definition. An entry with an error is not kept.
            Tab completes names, members after a dot, units after a number.
            Commands:
              :help           this text
              :load FILE      add a script file to the session
              :names          the names defined so far
              :reset          forget everything entered
              :quit           leave (so does Ctrl-D)""";
}
