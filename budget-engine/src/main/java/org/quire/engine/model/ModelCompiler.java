package org.quire.engine.model;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.quire.engine.units.Unit;
import org.quire.engine.units.UnitException;
import org.quire.engine.units.Units;

/**
 * Compiles model text into a {@link CompiledModel}: parses it, resolves every name against the inputs, the
 * quantities the equations define, the model's own functions and the function library, orders the equations
 * so that each is computed after the quantities it uses, and reports every problem with its line and column
 * (syntax errors, unknown names with the nearest known one, duplicate definitions, circular definitions,
 * wrong numbers of arguments, outputs no equation defines).
 *
 * <p>The result is a tree of our own node objects: no scripting engine, no reflection, no code generated from
 * user text. Thread-safe; it keeps the last few compiled models (immutable) to return them for the same input.
 */
public final class ModelCompiler {
    private final String text;
    private final List<String> inputs;
    private final List<String> outputs;
    private final FunctionLibrary library;
    private final ModelUnits units;
    private final List<ModelProblem> problems = new ArrayList<>();
    private final Set<String> reported = new LinkedHashSet<>();
    /** Names of equations whose line could not be read: their uses are not reported again. */
    private final Set<String> broken = new java.util.HashSet<>();
    private final Map<String, Integer> inputIndex = new HashMap<>();
    private final Map<String, Integer> quantityIndex = new LinkedHashMap<>();
    private final Map<String, Equation> functions = new LinkedHashMap<>();
    private final List<Equation> quantities = new ArrayList<>();
    private final Set<String> usedInputs = new LinkedHashSet<>();
    private int nextId;
    private int nodeDepth;
    private List<Node> consts = new ArrayList<>();

    /** Stops compiling when a limit of {@link ModelLimits} is passed; the problem is already recorded. */
    private static final class TooLarge extends RuntimeException {
        private static final long serialVersionUID = 1L;

        TooLarge() {
            super(null, null, false, false);
        }
    }

    private ModelCompiler(String text, List<String> inputs, List<String> outputs, FunctionLibrary library,
            ModelUnits units) {
        this.text = text;
        this.inputs = inputs;
        this.outputs = outputs;
        this.library = library;
        this.units = units;
    }

    /**
     * @param text the model: one equation a line
     * @param inputs the names of the input quantities, in budget order
     * @param outputs the names of the quantities to report, each defined by an equation
     * @param library the functions the model may call
     * @return the compiled model
     * @throws ModelException listing every error found
     */
    public static CompiledModel compile(String text, List<String> inputs, List<String> outputs,
            FunctionLibrary library) throws ModelException {
        return compile(text, inputs, outputs, library, ModelUnits.none());
    }

    /**
     * Compiles a model and checks its dimensions against the units stated for its inputs and outputs (see
     * {@link UnitCheck} for the rules and their limits). Where a library function's argument is in another unit
     * of the declared dimension (K for °C, kPa for Pa) a conversion is compiled in, so evaluation works on plain
     * doubles.
     *
     * @param units the units of the inputs and outputs, and the outputs' display units
     * @throws ModelException listing every error found, unit errors with their line and column
     */
    public static CompiledModel compile(String text, List<String> inputs, List<String> outputs,
            FunctionLibrary library, ModelUnits units) throws ModelException {
        Key key = new Key(text, List.copyOf(inputs), List.copyOf(outputs), library, units);
        synchronized (RECENT) {
            CompiledModel m = RECENT.get(key);
            if (m != null) {
                return m;
            }
        }
        CompiledModel m = new ModelCompiler(text, inputs, outputs, library, units).run();
        synchronized (RECENT) {
            RECENT.put(key, m);
        }
        return m;
    }

    /** Models compiled most recently, kept for a recalculation of the same model after an edit elsewhere. */
    private static final int RECENT_MODELS = 8;

    /**
     * The last {@value #RECENT_MODELS} models compiled, by everything their compilation reads: a compiled model is
     * immutable, so one compiled before is returned for the same text, names, library and units (a budget
     * recalculated after a changed estimate or uncertainty is not compiled again).
     */
    private static final java.util.Map<Key, CompiledModel> RECENT = new java.util.LinkedHashMap<>(16, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(java.util.Map.Entry<Key, CompiledModel> eldest) {
            return size() > RECENT_MODELS;
        }
    };

    /** What a compilation depends on; the library by identity (it is immutable). */
    private record Key(String text, List<String> inputs, List<String> outputs, FunctionLibrary library,
            ModelUnits units) {
        @Override
        public boolean equals(Object o) {
            return o instanceof Key k && library == k.library && text.equals(k.text) && inputs.equals(k.inputs)
                    && outputs.equals(k.outputs) && units.equals(k.units);
        }

        @Override
        public int hashCode() {
            return ((text.hashCode() * 31 + inputs.hashCode()) * 31 + outputs.hashCode()) * 31
                    + System.identityHashCode(library);
        }
    }

    /**
     * Checks a model without throwing, for live error marks in an editor.
     *
     * @return every problem found, errors and warnings, in text order
     */
    public static List<ModelProblem> check(String text, List<String> inputs, List<String> outputs,
            FunctionLibrary library) {
        return check(text, inputs, outputs, library, ModelUnits.none());
    }

    /**
     * Checks a model and its dimensions without throwing, for live error marks in an editor.
     *
     * @return every problem found, errors and warnings, in text order
     */
    public static List<ModelProblem> check(String text, List<String> inputs, List<String> outputs,
            FunctionLibrary library, ModelUnits units) {
        ModelCompiler c = new ModelCompiler(text, inputs, outputs, library, units);
        try {
            CompiledModel m = c.run();
            return m.warnings();
        } catch (ModelException e) {
            return e.problems();
        }
    }

    private void error(SourcePosition at, String message) {
        if (reported.add(at.line() + ":" + at.column() + ":" + message)) {
            problems.add(ModelProblem.error(at, message));
        }
    }

    private CompiledModel run() throws ModelException {
        if (text == null || text.isBlank()) {
            throw new ModelException(new ModelProblem(0, 0, 0, ModelProblem.Severity.ERROR,
                    "the model is empty: write at least one equation such as 'y = x1 + x2'"));
        }
        for (int k = 0; k < inputs.size(); k++) {
            inputIndex.put(inputs.get(k), k);
        }
        List<Equation> equations = Parser.parse(text, problems, broken);
        Map<String, Equation> seen = new HashMap<>();
        for (Equation eq : equations) {
            Equation before = seen.get(eq.name());
            if (before != null) {
                error(eq.at(), "'" + eq.name() + "' is already defined on line " + before.at().line());
                continue;
            }
            if (inputIndex.containsKey(eq.name())) {
                error(eq.at(), "'" + eq.name() + "' is an input quantity and cannot also be defined by an equation");
                continue;
            }
            if (FunctionLibrary.isStandard(eq.name()) || library.function(eq.name()) != null) {
                error(eq.at(), "'" + eq.name() + "' is the name of a built-in function or constant; choose another name");
                continue;
            }
            seen.put(eq.name(), eq);
            if (eq.isFunction()) {
                functions.put(eq.name(), eq);
            } else {
                quantityIndex.put(eq.name(), quantities.size());
                quantities.add(eq);
            }
        }
        for (String out : outputs) {
            if (!quantityIndex.containsKey(out) && !broken.contains(out)) {
                String known = String.join(", ", quantityIndex.keySet());
                problems.add(new ModelProblem(0, 0, 0, ModelProblem.Severity.ERROR,
                        "output '" + out + "' is not defined by any equation"
                                + (known.isEmpty() ? "" : " (the model defines: " + known + ")")
                                + Suggest.hint(out, quantityIndex.keySet())));
            }
        }
        Node[] roots = new Node[quantities.size()];
        List<Set<Integer>> deps = new ArrayList<>();
        try {
            for (int j = 0; j < quantities.size(); j++) {
                Set<Integer> d = new LinkedHashSet<>();
                roots[j] = node(quantities.get(j).expression(), Map.of(), new ArrayDeque<>(), d);
                deps.add(d);
            }
        } catch (TooLarge e) {
            throw new ModelException(problems);
        }
        int[] order = order(deps);
        if (problems.stream().noneMatch(ModelProblem::isError)) {
            List<SourcePosition> at = new ArrayList<>();
            for (Equation q : quantities) {
                at.add(q.at());
            }
            problems.addAll(UnitCheck.run(roots, order, new ArrayList<>(quantityIndex.keySet()), at, inputs,
                    outputs, units, () -> nextId++));
        }
        boolean hasErrors = problems.stream().anyMatch(ModelProblem::isError);
        if (hasErrors) {
            problems.sort((a, b) -> a.line() != b.line()
                    ? Integer.compare(a.line() == 0 ? Integer.MAX_VALUE : a.line(), b.line() == 0 ? Integer.MAX_VALUE : b.line())
                    : Integer.compare(a.column(), b.column()));
            throw new ModelException(problems);
        }
        List<ModelProblem> warnings = new ArrayList<>(problems);
        for (String in : inputs) {
            if (!usedInputs.contains(in)) {
                warnings.add(new ModelProblem(0, 0, 0, ModelProblem.Severity.WARNING,
                        "input '" + in + "' is not used by the model"));
            }
        }
        int[] outIdx = outputs.stream().mapToInt(quantityIndex::get).toArray();
        List<String> names = new ArrayList<>(quantityIndex.keySet());
        List<String> texts = new ArrayList<>();
        for (Equation q : quantities) {
            texts.add(q.text());
        }
        List<String> functionTexts = new ArrayList<>();
        for (Equation f : functions.values()) {
            functionTexts.add(f.text());
        }
        List<Formula.Line> lines = new ArrayList<>();
        for (Equation f : functions.values()) {
            lines.add(new Formula.Line(f.name(), f.parameters(), true, false,
                    formula(f.expression(), Set.copyOf(f.parameters())), f.text()));
        }
        for (Equation q : quantities) {
            lines.add(new Formula.Line(q.name(), List.of(), false, outputs.contains(q.name()),
                    formula(q.expression(), Set.of()), q.text()));
        }
        return new CompiledModel(List.copyOf(inputs), names, texts, functionTexts, roots, order, outIdx,
                List.copyOf(outputs), nextId, List.copyOf(consts), warnings, lines);
    }

    /** The expression with its names resolved; called only once the model compiled without errors. */
    private Formula formula(Expr e, Set<String> params) {
        if (e instanceof Expr.Num n) {
            return new Formula.Number(n.value(), n.written(), n.unit());
        }
        if (e instanceof Expr.Name n) {
            String name = n.name();
            Formula.Role role = params.contains(name) ? Formula.Role.PARAMETER
                    : inputIndex.containsKey(name) ? Formula.Role.INPUT
                    : quantityIndex.containsKey(name) ? Formula.Role.QUANTITY : Formula.Role.CONSTANT;
            return new Formula.Symbol(name, role);
        }
        if (e instanceof Expr.Unary u) {
            return new Formula.Negation(formula(u.operand(), params));
        }
        if (e instanceof Expr.Binary b) {
            return new Formula.Operation(b.op(), formula(b.left(), params), formula(b.right(), params));
        }
        Expr.Call c = (Expr.Call) e;
        List<Formula> args = new ArrayList<>();
        for (Expr a : c.args()) {
            args.add(formula(a, params));
        }
        Formula.FunctionKind kind = functions.containsKey(c.name()) ? Formula.FunctionKind.MODEL
                : FunctionLibrary.isStandard(c.name()) ? Formula.FunctionKind.STANDARD : Formula.FunctionKind.LIBRARY;
        return new Formula.Call(c.name(), kind, args);
    }

    /**
     * Topological order of the quantities (depth-first, with an explicit stack so that a chain of any length
     * cannot overflow the call stack); reports each circular definition once.
     */
    private int[] order(List<Set<Integer>> deps) {
        int n = deps.size();
        int[] state = new int[n];
        List<Integer> out = new ArrayList<>();
        List<java.util.Iterator<Integer>> iterators = new ArrayList<>(n);
        for (int j = 0; j < n; j++) {
            iterators.add(null);
        }
        Deque<Integer> path = new ArrayDeque<>();
        for (int start = 0; start < n; start++) {
            if (state[start] != 0) {
                continue;
            }
            state[start] = 1;
            path.push(start);
            iterators.set(start, deps.get(start).iterator());
            while (!path.isEmpty()) {
                int j = path.peek();
                java.util.Iterator<Integer> it = iterators.get(j);
                if (it.hasNext()) {
                    int k = it.next();
                    if (state[k] == 1) {
                        cycle(k, path);
                    } else if (state[k] == 0) {
                        state[k] = 1;
                        path.push(k);
                        iterators.set(k, deps.get(k).iterator());
                    }
                } else {
                    path.pop();
                    state[j] = 2;
                    iterators.set(j, null);
                    out.add(j);
                }
            }
        }
        return out.stream().mapToInt(Integer::intValue).toArray();
    }

    private void cycle(int j, Deque<Integer> path) {
        List<String> cycle = new ArrayList<>();
        boolean in = false;
        for (java.util.Iterator<Integer> it = path.descendingIterator(); it.hasNext();) {
            int k = it.next();
            if (k == j) {
                in = true;
            }
            if (in) {
                cycle.add(quantities.get(k).name());
            }
        }
        cycle.add(quantities.get(j).name());
        String text = cycle.size() <= 12 ? String.join(" -> ", cycle)
                : String.join(" -> ", cycle.subList(0, 5)) + " -> ... (" + (cycle.size() - 10) + " more) -> "
                        + String.join(" -> ", cycle.subList(cycle.size() - 5, cycle.size()));
        error(quantities.get(j).at(), "circular definition: " + text);
    }

    private Node constant(SourcePosition at, String text, double v) {
        return constant(at, text, v, null);
    }

    private Node constant(SourcePosition at, String text, double v, Unit unit) {
        Node c = new Node.Const(nextId++, at, text, v, unit);
        consts.add(c);
        return c;
    }

    private Node node(Expr e, Map<String, Node> params, Deque<String> calling, Set<Integer> deps) {
        if (nextId > ModelLimits.MAX_NODES) {
            error(e.at(), ModelLimits.tooManyNodes(ModelLimits.MAX_NODES));
            throw new TooLarge();
        }
        if (nodeDepth >= ModelLimits.MAX_NODE_DEPTH) {
            error(e.at(), ModelLimits.nodesTooDeep(ModelLimits.MAX_NODE_DEPTH));
            throw new TooLarge();
        }
        nodeDepth++;
        try {
            return nodeNested(e, params, calling, deps);
        } finally {
            nodeDepth--;
        }
    }

    private Node nodeNested(Expr e, Map<String, Node> params, Deque<String> calling, Set<Integer> deps) {
        String txt = ExprPrinter.print(e);
        if (e instanceof Expr.Num n) {
            Unit unit = null;
            if (!n.unit().isEmpty()) {
                try {
                    unit = Units.parse(n.unit());
                } catch (UnitException x) {
                    error(n.unitAt(), "unit [" + n.unit() + "] of the number " + n.written() + ": " + x.getMessage());
                }
            }
            return constant(e.at(), txt, n.value(), unit);
        }
        if (e instanceof Expr.Name) {
            String name = ((Expr.Name) e).name();
            Node p = params.get(name);
            if (p != null) {
                return p;
            }
            Integer in = inputIndex.get(name);
            if (in != null) {
                usedInputs.add(name);
                return new Node.Input(nextId++, e.at(), txt, in);
            }
            Integer q = quantityIndex.get(name);
            if (q != null) {
                deps.add(q);
                return new Node.Quantity(nextId++, e.at(), txt, q);
            }
            if (name.equals("pi")) {
                return constant(e.at(), txt, Math.PI);
            }
            if (functions.containsKey(name) || Node.Fn.bySymbol(name) != null || library.function(name) != null) {
                error(e.at(), "'" + name + "' is a function; call it with its arguments in parentheses");
                return constant(e.at(), txt, Double.NaN);
            }
            if (broken.contains(name)) {
                return constant(e.at(), txt, Double.NaN); // its own line is reported already
            }
            List<String> known = new ArrayList<>(inputIndex.keySet());
            known.addAll(quantityIndex.keySet());
            known.addAll(params.keySet());
            known.add("pi");
            error(e.at(), "unknown name '" + name + "'" + Suggest.hint(name, known));
            return constant(e.at(), txt, Double.NaN);
        }
        if (e instanceof Expr.Unary) {
            Node a = node(((Expr.Unary) e).operand(), params, calling, deps);
            if (a instanceof Node.Const k) {
                return constant(e.at(), txt, -k.value, k.unit);
            }
            return new Node.Neg(nextId++, e.at(), txt, a);
        }
        if (e instanceof Expr.Binary) {
            Expr.Binary b = (Expr.Binary) e;
            Node a = node(b.left(), params, calling, deps);
            Node c = node(b.right(), params, calling, deps);
            if (b.op() == '^') {
                if (c instanceof Node.Const kc && kc.unit == null) {
                    double k = kc.value;
                    if (k == Math.rint(k) && Math.abs(k) <= 64) {
                        return new Node.PowInt(nextId++, e.at(), txt, a, (int) k);
                    }
                }
                return new Node.Pow(nextId++, e.at(), txt, a, c);
            }
            return new Node.Arith(nextId++, e.at(), txt, b.op(), a, c);
        }
        Expr.Call call = (Expr.Call) e;
        String name = call.name();
        int argc = call.args().size();
        Node[] args = new Node[argc];
        for (int k = 0; k < argc; k++) {
            args[k] = node(call.args().get(k), params, calling, deps);
        }
        Node.Fn fn = Node.Fn.bySymbol(name);
        if (fn != null) {
            if (argc != 1) {
                error(call.at(), "function '" + name + "' takes 1 argument, not " + argc);
                return constant(e.at(), txt, Double.NaN);
            }
            return new Node.Func1(nextId++, e.at(), txt, fn, args[0]);
        }
        if (name.equals("min") || name.equals("max")) {
            if (argc < 2) {
                error(call.at(), "function '" + name + "' takes 2 or more arguments, not " + argc);
                return constant(e.at(), txt, Double.NaN);
            }
            return new Node.MinMax(nextId++, e.at(), txt, name.equals("max"), args);
        }
        Equation user = functions.get(name);
        if (user != null) {
            if (argc != user.parameters().size()) {
                error(call.at(), "function '" + name + "' (line " + user.at().line() + ") takes "
                        + user.parameters().size() + " argument" + (user.parameters().size() == 1 ? "" : "s")
                        + ", not " + argc);
                return constant(e.at(), txt, Double.NaN);
            }
            if (calling.contains(name)) {
                error(call.at(), "function '" + name + "' calls itself (through " + String.join(" -> ", calling)
                        + "); functions may not be recursive");
                return constant(e.at(), txt, Double.NaN);
            }
            Map<String, Node> bound = new HashMap<>();
            for (int k = 0; k < argc; k++) {
                bound.put(user.parameters().get(k), args[k]);
            }
            calling.push(name);
            Node body = node(user.expression(), bound, calling, deps);
            calling.pop();
            return body;
        }
        ModelFunction lib = library.function(name);
        if (lib != null) {
            if (argc < lib.minArity() || argc > lib.maxArity()) {
                error(call.at(), "function '" + name + "(" + String.join(", ", lib.parameters()) + ")' takes "
                        + (lib.minArity() == lib.maxArity() ? String.valueOf(lib.minArity())
                                : lib.minArity() + " to " + lib.maxArity())
                        + " argument" + (lib.maxArity() == 1 ? "" : "s") + ", not " + argc);
                return constant(e.at(), txt, Double.NaN);
            }
            return new Node.External(nextId++, e.at(), txt, lib, args);
        }
        if (broken.contains(name)) {
            return constant(e.at(), txt, Double.NaN); // the function's own line is reported already
        }
        List<String> known = new ArrayList<>(library.allNames());
        known.addAll(functions.keySet());
        error(call.at(), "unknown function '" + name + "'" + Suggest.hint(name, known));
        return constant(e.at(), txt, Double.NaN);
    }
}
