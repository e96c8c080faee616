package org.quire.engine.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.quire.engine.flow.FlowFunctions;

/**
 * Numbers written with a unit in the model ({@code 1000 [mg/g]}), so that the dimension check covers conversion
 * factors. The arithmetic of the expected conversions is exact: 1 g = 1000 mg, 1 kg = 1000 g, 1 L = 10^-3 m^3
 * (BIPM SI Brochure, 9th edition (2019), Tables 7 and 8); only like quantities are added (ISO 80000-1:2009).
 */
class NumberWithUnitTest {
    private static final FunctionLibrary LIBRARY = FunctionLibrary.standard().with(FlowFunctions.all());

    private static ModelUnits units(String in, String inUnit, String out, String outUnit) {
        return ModelUnits.none().withInput(in, inUnit).withOutput(out, outUnit, "");
    }

    private static CompiledModel compile(String model, ModelUnits u) throws ModelException {
        return ModelCompiler.compile(model, List.of("dm"), List.of("m"), LIBRARY, u);
    }

    private static List<ModelProblem> errors(String model, ModelUnits u) {
        ModelException e = assertThrows(ModelException.class, () -> compile(model, u));
        return e.problems().stream().filter(ModelProblem::isError).collect(Collectors.toList());
    }

    @Test
    void aWrongConversionFactorWithItsUnitIsRefusedAtItsLineAndColumn() {
        ModelUnits u = units("dm", "mg", "m", "g");
        // dm in mg, m in g: 1000 [mg/g] * dm is in mg^2/g, a million times too large
        List<ModelProblem> e = errors("m = 1000 [mg/g] * dm", u);
        assertEquals(1, e.size(), e::toString);
        assertEquals(1, e.get(0).line());
        assertTrue(e.get(0).message().startsWith("output m is stated in g but its equation computes it in "),
                e.get(0).message());
        // the factor of another pair of units: g/kg * mg is 10^-9 kg, not the 10^-3 kg of g
        List<ModelProblem> s = errors("m = 1000 [g/kg] * dm", u);
        assertEquals(1, s.size(), s::toString);
        assertEquals(1, s.get(0).line());
        // and inside a sum: the left side is in g, the right side in mg
        List<ModelProblem> sum = errors("m = dm / 1000 [mg/g] + dm * 1 [1]", u);
        assertEquals(1, sum.size(), sum::toString);
        assertEquals(22, sum.get(0).column(), sum::toString);
    }

    @Test
    void theRightConversionFactorIsAcceptedAndGivesTheRightValue() throws Exception {
        ModelUnits u = units("dm", "mg", "m", "g");
        CompiledModel a = compile("m = dm / 1000 [mg/g]", u);
        assertEquals(0.25, a.evaluate(new double[] {250})[0], 1e-15);
        CompiledModel b = compile("m = 1e-3 [g/mg] * dm", u);
        assertEquals(0.25, b.evaluate(new double[] {250})[0], 1e-15);
        assertTrue(a.warnings().isEmpty() && b.warnings().isEmpty(), a.warnings() + " " + b.warnings());
    }

    @Test
    void aBareNumberStaysAPureNumberWhoseScaleIsNotChecked() throws Exception {
        // documented limitation: a bare number may be a conversion factor, so its scale is not compared
        ModelUnits u = units("dm", "mg", "m", "g");
        CompiledModel m = compile("m = 1000 * dm", u);
        assertEquals(250000, m.evaluate(new double[] {250})[0], 1e-9);
    }

    @Test
    void aReferenceValueWithItsUnitMayBeAddedToAQuantityOfThatUnit() throws Exception {
        ModelUnits u = units("dm", "°C", "m", "°C");
        assertEquals(1.5, compile("m = dm - 20 [°C]", u).evaluate(new double[] {21.5})[0], 1e-12);
        List<ModelProblem> e = errors("m = dm - 20 [kg]", u);
        assertEquals(1, e.size(), e::toString);
        assertEquals(8, e.get(0).column(), e::toString);
        // a bare 20 next to a temperature is still refused, as before
        assertEquals(1, errors("m = dm - 20", u).size());
    }

    @Test
    void writingMistakesAreErrorsWithLineAndColumn() {
        ModelUnits u = units("dm", "mg", "m", "g");
        ModelProblem unknown = errors("m = dm / 1000 [mg/gg]", u).get(0);
        assertEquals(1, unknown.line());
        assertEquals(15, unknown.column());
        assertTrue(unknown.message().contains("unit [mg/gg] of the number 1000"), unknown.message());
        ModelProblem open = errors("m = dm / 1000 [mg/g\n", u).get(0);
        assertTrue(open.message().contains("no closing ']'"), open.message());
        ModelProblem afterName = errors("m = dm [mg] / 1000", u).get(0);
        assertEquals(8, afterName.column());
        assertTrue(afterName.message().contains("belongs right after a number"), afterName.message());
        ModelProblem exponent = errors("m = dm ^ 2 [g] / dm", u).get(0);
        assertTrue(exponent.message().startsWith("an exponent must be dimensionless: '2 [g]' is in g"),
                exponent.message());
    }

    @Test
    void theUnitIsKeptWhenTheModelIsWrittenBack() throws Exception {
        ModelUnits u = units("dm", "mg", "m", "g");
        CompiledModel a = compile("m = dm / -1000 [mg/g]", u);
        assertEquals(-0.25, a.evaluate(new double[] {250})[0], 1e-15);
        Formula f = a.lines().get(0).right();
        assertTrue(f.toString().contains("mg/g"), f.toString());
    }
}
