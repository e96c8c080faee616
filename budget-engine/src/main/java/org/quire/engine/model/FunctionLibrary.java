package org.quire.engine.model;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The functions a model may call. The standard mathematical functions ({@code sqrt exp ln log10 abs sin cos
 * tan asin acos atan min max}) and the constant {@code pi} are always there; further {@link ModelFunction}s
 * (the flow-metrology functions, for instance) are added with {@link #with(Collection)}.
 *
 * <p>Immutable and thread-safe.
 */
public final class FunctionLibrary {
    private static final FunctionLibrary STANDARD = new FunctionLibrary(Map.of());
    private final Map<String, ModelFunction> extra;

    private FunctionLibrary(Map<String, ModelFunction> extra) {
        this.extra = extra;
    }

    /** @return the library with only the standard functions */
    public static FunctionLibrary standard() {
        return STANDARD;
    }

    /**
     * @param functions further functions; their names must not clash with each other or the standard ones
     * @return a library with these functions added
     */
    public FunctionLibrary with(Collection<? extends ModelFunction> functions) {
        Map<String, ModelFunction> m = new LinkedHashMap<>(extra);
        for (ModelFunction f : functions) {
            if (isStandard(f.name()) || m.containsKey(f.name())) {
                throw new IllegalArgumentException("function name '" + f.name() + "' is already taken");
            }
            m.put(f.name(), f);
        }
        return new FunctionLibrary(Collections.unmodifiableMap(m));
    }

    /** @return whether {@code name} is a standard function or constant */
    public static boolean isStandard(String name) {
        return Node.Fn.bySymbol(name) != null || name.equals("min") || name.equals("max") || name.equals("pi");
    }

    /** @return the added function of this name, or {@code null} */
    public ModelFunction function(String name) {
        return extra.get(name);
    }

    /** @return the added functions */
    public Collection<ModelFunction> functions() {
        return extra.values();
    }

    /** @return every name a model may call or use as a constant, for suggestions and syntax colouring */
    public List<String> allNames() {
        List<String> names = new ArrayList<>();
        for (Node.Fn f : Node.Fn.values()) {
            names.add(f.symbol);
        }
        names.add("min");
        names.add("max");
        names.add("pi");
        names.addAll(extra.keySet());
        return names;
    }
}
