package org.rosetra.lang.check;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** Every name a script declares, in the order written. Built by the {@link Resolver}. */
public final class SymbolTable {

    private final Map<String, Symbol> byName;

    SymbolTable(Map<String, Symbol> byName) {
        this.byName = Collections.unmodifiableMap(new LinkedHashMap<>(byName));
    }

    public Optional<Symbol> find(String name) {
        return Optional.ofNullable(byName.get(name));
    }

    public boolean isKind(String name, SymbolKind kind) {
        Symbol symbol = byName.get(name);
        return symbol != null && symbol.kind() == kind;
    }

    /** Every symbol, in the order declared. */
    public List<Symbol> all() {
        return List.copyOf(byName.values());
    }

    public List<Symbol> ofKind(SymbolKind kind) {
        return byName.values().stream().filter(s -> s.kind() == kind).toList();
    }

    /** The names of every symbol of one of these kinds, for "did you mean" hints. */
    public List<String> namesOf(SymbolKind... kinds) {
        List<SymbolKind> wanted = List.of(kinds);
        return byName.values().stream().filter(s -> wanted.contains(s.kind())).map(Symbol::text).toList();
    }
}
