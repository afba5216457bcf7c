// The Rosetra script language (LANGUAGE.md is the normative reference).
//
// Line-oriented: one statement per line, one field per line inside a block. Newlines are
// tokens. BracketBalancer (run between lexer and parser) drops the newlines inside
// parentheses and brackets, closes a block left open before the next statement, and drops
// stray tokens the lexer could not use, so this grammar only sees well-shaped lines.
// A reading list may continue on the next line after a comma.
//
// UNITS AFTER A NUMBER (the rule that separates `2 MPa` from `2 * x`):
//   1. A unit may only follow a number or a string literal directly: `205 GPa`, `"t_s" s`.
//      Any name right after a number starts its unit (an unknown one is reported by the
//      checker with a suggestion), so `2 x` is "unknown unit 'x'", never a product.
//   2. The unit continues over `*` or `/` only while the next token is a known unit
//      symbol (asked of the unit table through `unitSymbols`) that is not followed by
//      `(`: `2 N/mm^2` and `205 GPa * 2` (= 410 GPa) both read as written; `min(x)`
//      with its parenthesis is always a call.
//   3. `^` right after a unit symbol is part of the unit: `2 mm^2` is two square
//      millimetres. Write `(2 mm)^2` for the square of a length.
//   So `s355.yield / 1.5`, `max(a) / 2 MPa` and `0.6 * proof_60kN` need nothing special;
//   a name that is also a unit symbol (m, s, h, K, min...) after a unit is taken as a
//   unit: write `(2 MPa) * m` to multiply by a value named m.
grammar Rosetra;

// No @header package: antlr4-maven-plugin derives org.rosetra.lang.syntax from the folder
// (a second package line would not compile).

@parser::members {
    /** Which names are unit symbols; decides rule 2 above. Set by ScriptParser. */
    java.util.function.Predicate<String> unitSymbols = symbol -> false;

    private boolean unitContinues() {
        Token symbol = _input.LT(2);
        if (symbol.getType() == PERCENT) {
            return true;
        }
        return symbol.getType() == NAME
            && _input.LT(3).getType() != LPAREN
            && unitSymbols.test(symbol.getText());
    }
}

// Shaped so that every decision between lines needs one token of lookahead: an error
// then shows up where it is, not as a failure to predict the whole script.
script     : statement? (NL statement?)* EOF ;

statement
    : TITLE STRING                                              # titleStatement
    | kind=(MATERIAL | GAUGE | ROSETTE | STRAIN | STRESS) NAME block  # declarationStatement
    | BASELINE NAME block                                       # baselineStatement
    | CASE NAME (FROM from=NAME)? block                         # caseStatement
    | COMBINE NAME ASSIGN combineTerm (combineSign combineTerm)*   # combineStatement
    | SERIES NAME FROM STRING block                             # seriesStatement
    | LET NAME (LPAREN (param (COMMA param)*)? RPAREN)? (COLON result=anyName)?
          ASSIGN (expr | JAVA_BLOCK)                            # letStatement
    | CHECK STRING COLON expr comparison expr                   # checkStatement
    | TABLE expr (COMMA expr)*                                  # tableStatement
    | PLOT kind=NAME? expr                                      # plotStatement
    | REPORT STRING                                             # reportStatement
    | USE (NAME | STRING)                                       # useStatement
    | DISPLAY anyName (ASSIGN unit)?                            # displayStatement
    ;

// A bare value, for a REPL or notebook cell that asks to see one (not part of a script).
expressionCell : NL* expr NL* EOF ;

block       : LBRACE field? (NL field?)* RBRACE ;
field       : anyName ASSIGN fieldValue ;
// `a to b` is a time window; `a, b, c unit` a reading list (or a list of column names).
fieldValue  : expr ( TO expr | (COMMA NL* expr)* ) ;

combineTerm : MINUS? (NUMBER STAR)? NAME ;
combineSign : PLUS | MINUS ;
param       : NAME (COLON anyName)? ;
comparison  : LESS | LESS_EQUAL | GREATER | GREATER_EQUAL ;

expr
    : expr DOT anyName                                          # memberExpr
    | expr LBRACKET NAME RBRACKET                               # indexExpr
    | <assoc=right> expr CARET expr                             # powerExpr
    | MINUS expr                                                # negateExpr
    | expr op=(STAR | SLASH) expr                               # productExpr
    | expr op=(PLUS | MINUS) expr                               # sumExpr
    | NUMBER unit?                                              # numberExpr
    | STRING unit?                                              # stringExpr
    | NAME LPAREN (expr (COMMA expr)*)? RPAREN                  # callExpr
    | NAME                                                      # nameExpr
    | LPAREN expr RPAREN                                        # parenExpr
    ;

unit        : unitPower ({unitContinues()}? op=(STAR | SLASH) unitPower)* ;
unitPower   : unitSymbol (CARET MINUS? NUMBER)? ;
unitSymbol  : NAME | PERCENT ;

// Keywords are reserved as statement names, but a field, member, dimension or display
// subject may still be spelled like one (`gauge = foil350`, `display stress = ksi`).
anyName
    : NAME | TITLE | MATERIAL | GAUGE | ROSETTE | STRAIN | STRESS | BASELINE | CASE
    | FROM | COMBINE | SERIES | LET | CHECK | TABLE | PLOT | REPORT | USE | DISPLAY | TO
    ;

TITLE    : 'title' ;
MATERIAL : 'material' ;
GAUGE    : 'gauge' ;
ROSETTE  : 'rosette' ;
STRAIN   : 'strain' ;
STRESS   : 'stress' ;
BASELINE : 'baseline' ;
CASE     : 'case' ;
FROM     : 'from' ;
COMBINE  : 'combine' ;
SERIES   : 'series' ;
LET      : 'let' ;
CHECK    : 'check' ;
TABLE    : 'table' ;
PLOT     : 'plot' ;
REPORT   : 'report' ;
USE      : 'use' ;
DISPLAY  : 'display' ;
TO       : 'to' ;

// A Java-bodied function: kept as one raw token, braces balanced, for the Java bridge.
// `java` followed by `{` always lexes as this token, so `java` is best left unused as a name.
JAVA_BLOCK : 'java' [ \t]* JAVA_BRACES ;
fragment JAVA_BRACES : '{' ( JAVA_BRACES | JAVA_STRING | JAVA_CHAR | ~[{}"'] )* '}' ;
fragment JAVA_STRING : '"' ( '\\' . | ~["\\\r\n] )* '"' ;
fragment JAVA_CHAR   : '\'' ( '\\' . | ~['\\\r\n] )* '\'' ;

NUMBER : DIGITS ('.' DIGITS?)? EXPONENT? | '.' DIGITS EXPONENT? ;
fragment DIGITS   : [0-9]+ ;
fragment EXPONENT : [eE] [+-]? DIGITS ;

STRING          : '"' ( '\\' [\\"nt] | ~["\\\r\n] )* '"' ;
UNCLOSED_STRING : '"' ( '\\' . | ~["\\\r\n] )* ;

// Letters in any script, so that the microstrain sign µε (U+00B5 or U+03BC) is a name.
NAME : [\p{L}_] [\p{L}\p{Nd}_]* ;

LPAREN   : '(' ;
RPAREN   : ')' ;
LBRACE   : '{' ;
RBRACE   : '}' ;
LBRACKET : '[' ;
RBRACKET : ']' ;
COMMA    : ',' ;
COLON    : ':' ;
DOT      : '.' ;
LESS_EQUAL    : '<=' ;
GREATER_EQUAL : '>=' ;
LESS     : '<' ;
GREATER  : '>' ;
ASSIGN   : '=' ;
PLUS     : '+' ;
MINUS    : '-' ;
STAR     : '*' ;
SLASH    : '/' ;
CARET    : '^' ;
PERCENT  : '%' ;

NL       : '\r'? '\n' | '\r' ;
COMMENT  : '#' ~[\r\n]* -> skip ;
SPACE    : [ \t\f\uFEFF]+ -> skip ;

// Anything else becomes one token that BracketBalancer reports and drops.
STRAY    : . ;
