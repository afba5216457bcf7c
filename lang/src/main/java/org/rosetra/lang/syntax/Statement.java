package org.rosetra.lang.syntax;

/** One line of a script (a declaration or a reading block may take several lines). */
public sealed interface Statement extends Node
        permits Title, Declaration, Baseline, Case, Combine, Series, Let, Check, Table, Plot,
                Report, Use, Display {
}
