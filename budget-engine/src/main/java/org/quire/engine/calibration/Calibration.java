package org.quire.engine.calibration;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.quire.engine.document.TemplateOrigin;

/**
 * The calibration of a meter across its range: the method (a budget template for one run at one flow point,
 * fixed by id, version and content hash), the output of the method that is the meter's error (in % of the
 * reading) and the one that is the flow, the meter's calibration constant as found, the declaration of every
 * input of the method (shared, independent or correlated between points), the repeatability basis, the as-found
 * points with their runs, optionally measured as-left points, the adjustment, the laboratory's CMC table, the
 * conformity specification, an optional Monte Carlo request, and the details a certificate states.
 *
 * <p>Evaluate it with {@link CalibrationEvaluator}. Immutable and thread-safe; every {@code with...} method
 * returns a changed copy.
 */
public final class Calibration {
    private final String title;
    private final CertificateDetails details;
    private final TemplateOrigin method;
    private final String errorOutput;
    private final String flowOutput;
    private final CalibrationConstant constant;
    private final Map<String, InputDeclaration> declarations;
    private final RepeatabilityBasis repeatability;
    private final List<FlowPoint> asFound;
    private final List<FlowPoint> asLeft;
    private final Adjustment adjustment;
    private final CmcTable cmc;
    private final ConformitySpec conformity;
    private final MonteCarloRequest monteCarlo;

    private Calibration(String title, CertificateDetails details, TemplateOrigin method, String errorOutput,
            String flowOutput, CalibrationConstant constant, Map<String, InputDeclaration> declarations,
            RepeatabilityBasis repeatability, List<FlowPoint> asFound, List<FlowPoint> asLeft, Adjustment adjustment,
            CmcTable cmc, ConformitySpec conformity, MonteCarloRequest monteCarlo) {
        this.title = title == null ? "" : title.strip();
        this.details = details == null ? CertificateDetails.none() : details;
        this.method = Objects.requireNonNull(method, "method");
        this.errorOutput = name("error output", errorOutput);
        this.flowOutput = name("flow output", flowOutput);
        if (this.errorOutput.equals(this.flowOutput)) {
            throw new IllegalArgumentException(CalibrationMessages.sameOutput(this.errorOutput));
        }
        if (constant == null) {
            throw new IllegalArgumentException(CalibrationMessages.missing("calibration constant"));
        }
        this.constant = constant;
        if (declarations == null) {
            throw new IllegalArgumentException(CalibrationMessages.missing("declarations of the inputs"));
        }
        Map<String, InputDeclaration> d = new LinkedHashMap<>();
        for (Map.Entry<String, InputDeclaration> e : declarations.entrySet()) {
            if (e.getValue() == null) {
                throw new IllegalArgumentException(CalibrationMessages.missing("declaration of input '" + e.getKey() + "'"));
            }
            d.put(e.getKey(), e.getValue());
        }
        this.declarations = Collections.unmodifiableMap(d);
        if (repeatability == null) {
            throw new IllegalArgumentException(CalibrationMessages.missing("repeatability basis"));
        }
        this.repeatability = repeatability;
        if (asFound == null || asFound.isEmpty()) {
            throw new IllegalArgumentException(CalibrationMessages.noPoints());
        }
        this.asFound = List.copyOf(asFound);
        this.asLeft = asLeft == null ? List.of() : List.copyOf(asLeft);
        checkLabels(this.asFound, "as-found");
        checkLabels(this.asLeft, "as-left");
        this.adjustment = adjustment == null ? Adjustment.none() : adjustment;
        this.cmc = cmc;
        this.conformity = conformity;
        this.monteCarlo = monteCarlo;
    }

    private static String name(String what, String v) {
        if (v == null || v.isBlank()) {
            throw new IllegalArgumentException(CalibrationMessages.blank(what));
        }
        return v.strip();
    }

    private static void checkLabels(List<FlowPoint> points, String phase) {
        java.util.Set<String> seen = new java.util.HashSet<>();
        for (FlowPoint p : points) {
            if (!seen.add(p.label())) {
                throw new IllegalArgumentException(CalibrationMessages.duplicatePoint(phase, p.label()));
            }
        }
    }

    /**
     * @param method the method template's id, version and content hash
     * @param errorOutput the method output that is the meter's error, in % of the reading
     * @param flowOutput the method output that is the flow
     * @param constant the meter's calibration constant as found
     * @param declarations one declaration per input of the method (checked against the method on evaluation)
     * @param asFound the as-found points, at least one
     * @return a calibration with mean-of-runs repeatability, no adjustment, no as-left runs, no CMC, no
     *     conformity, no Monte Carlo and no certificate details
     */
    public static Calibration of(TemplateOrigin method, String errorOutput, String flowOutput,
            CalibrationConstant constant, Map<String, InputDeclaration> declarations, List<FlowPoint> asFound) {
        return new Calibration("", null, method, errorOutput, flowOutput, constant, declarations,
                RepeatabilityBasis.MEAN_OF_RUNS, asFound, List.of(), Adjustment.none(), null, null, null);
    }

    private Calibration copy(String t, CertificateDetails de, TemplateOrigin m, Map<String, InputDeclaration> dc,
            RepeatabilityBasis rb, List<FlowPoint> af, List<FlowPoint> al, Adjustment a, CmcTable c,
            ConformitySpec cs, MonteCarloRequest mc, CalibrationConstant k) {
        return new Calibration(t, de, m, errorOutput, flowOutput, k, dc, rb, af, al, a, c, cs, mc);
    }

    public Calibration withTitle(String v) { return copy(v, details, method, declarations, repeatability, asFound, asLeft, adjustment, cmc, conformity, monteCarlo, constant); }
    public Calibration withDetails(CertificateDetails v) { return copy(title, v, method, declarations, repeatability, asFound, asLeft, adjustment, cmc, conformity, monteCarlo, constant); }
    public Calibration withMethod(TemplateOrigin v) { return copy(title, details, v, declarations, repeatability, asFound, asLeft, adjustment, cmc, conformity, monteCarlo, constant); }
    public Calibration withDeclarations(Map<String, InputDeclaration> v) { return copy(title, details, method, v, repeatability, asFound, asLeft, adjustment, cmc, conformity, monteCarlo, constant); }
    public Calibration withRepeatability(RepeatabilityBasis v) { return copy(title, details, method, declarations, v, asFound, asLeft, adjustment, cmc, conformity, monteCarlo, constant); }
    public Calibration withAsFound(List<FlowPoint> v) { return copy(title, details, method, declarations, repeatability, v, asLeft, adjustment, cmc, conformity, monteCarlo, constant); }
    /** @param v measured as-left points (runs after the adjustment); empty to predict the as-left results */
    public Calibration withAsLeft(List<FlowPoint> v) { return copy(title, details, method, declarations, repeatability, asFound, v, adjustment, cmc, conformity, monteCarlo, constant); }
    public Calibration withAdjustment(Adjustment v) { return copy(title, details, method, declarations, repeatability, asFound, asLeft, v, cmc, conformity, monteCarlo, constant); }
    /** @param v the CMC table, or null for none */
    public Calibration withCmc(CmcTable v) { return copy(title, details, method, declarations, repeatability, asFound, asLeft, adjustment, v, conformity, monteCarlo, constant); }
    /** @param v the conformity specification, or null for none */
    public Calibration withConformity(ConformitySpec v) { return copy(title, details, method, declarations, repeatability, asFound, asLeft, adjustment, cmc, v, monteCarlo, constant); }
    /** @param v the Monte Carlo request, or null for none */
    public Calibration withMonteCarlo(MonteCarloRequest v) { return copy(title, details, method, declarations, repeatability, asFound, asLeft, adjustment, cmc, conformity, v, constant); }
    public Calibration withConstant(CalibrationConstant v) { return copy(title, details, method, declarations, repeatability, asFound, asLeft, adjustment, cmc, conformity, monteCarlo, v); }

    public String title() { return title; }
    public CertificateDetails details() { return details; }
    /** @return the method template's id, version and content hash */
    public TemplateOrigin method() { return method; }
    public String errorOutput() { return errorOutput; }
    public String flowOutput() { return flowOutput; }
    public CalibrationConstant constant() { return constant; }
    /** @return the declaration per input name, in file order; unmodifiable */
    public Map<String, InputDeclaration> declarations() { return declarations; }
    public RepeatabilityBasis repeatability() { return repeatability; }
    public List<FlowPoint> asFound() { return asFound; }
    /** @return the measured as-left points; empty when the as-left results are predicted or not needed */
    public List<FlowPoint> asLeft() { return asLeft; }
    public Adjustment adjustment() { return adjustment; }
    /** @return the CMC table, or null */
    public CmcTable cmc() { return cmc; }
    /** @return the conformity specification, or null */
    public ConformitySpec conformity() { return conformity; }
    /** @return the Monte Carlo request, or null */
    public MonteCarloRequest monteCarlo() { return monteCarlo; }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof Calibration)) {
            return false;
        }
        Calibration c = (Calibration) o;
        return title.equals(c.title) && details.equals(c.details) && method.equals(c.method)
                && errorOutput.equals(c.errorOutput) && flowOutput.equals(c.flowOutput) && constant.equals(c.constant)
                && declarations.equals(c.declarations) && repeatability == c.repeatability && asFound.equals(c.asFound)
                && asLeft.equals(c.asLeft) && adjustment.equals(c.adjustment) && Objects.equals(cmc, c.cmc)
                && Objects.equals(conformity, c.conformity) && Objects.equals(monteCarlo, c.monteCarlo);
    }

    @Override
    public int hashCode() {
        return Objects.hash(title, method, errorOutput, flowOutput, asFound);
    }
}
