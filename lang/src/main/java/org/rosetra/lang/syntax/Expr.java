package org.rosetra.lang.syntax;

/** A value in a script. Compare by identity when keying maps (IdentityHashMap). */
public sealed interface Expr extends Node
        permits NumberLit, QuantityLit, ReadingList, StringLit, StringList, NameRef, Member,
                Index, Call, Binary, Negate, Range, JavaCode {
}
