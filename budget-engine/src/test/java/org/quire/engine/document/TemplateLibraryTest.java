package org.quire.engine.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.engine.budget.InputQuantity;

/** Templates: parameters, provenance, the three library folders, comparing with a newer version, publishing. */
class TemplateLibraryTest {
    private static final Map<String, Double> RUN = Map.of("m_net", 99.87, "T_tank", 20.4, "V_meter", 100.05);

    @Test
    void aDocumentFromATemplateHasTheParameterValuesAndRecordsTheTemplate() throws Exception {
        Template t = Fixtures.templateV1();
        BudgetDocument d = TemplateLibrary.newFromTemplate(t, RUN, "Ash Penrose", Fixtures.T0);
        assertEquals(99.87, d.budget().input("m_net").evaluation().estimate());
        assertEquals(20.4, d.budget().input("T_tank").evaluation().estimate());
        assertEquals(0.15 / Math.sqrt(3), d.budget().input("T_tank").evaluation().standardUncertainty(), 1e-15);
        assertEquals(new TemplateOrigin("tvfl-gravimetric-water", 1, t.contentHash(), t.spec().locked()),
                d.templateOrigin());
        assertNull(d.template());
        // the template's own laboratory is not carried into the new budget
        assertEquals("", d.laboratory());
        assertEquals(1, d.revision());
        assertTrue(t.spec().lockViolations(t.document().budget(), d.budget()).isEmpty());
        BudgetDocument withDefault = t.instantiate(Map.of("m_net", 50.0, "V_meter", 50.2), "Ash Penrose",
                Fixtures.T0);
        assertEquals(20.0, withDefault.budget().input("T_tank").evaluation().estimate());
    }

    @Test
    void missingUnknownAndOutOfRangeParametersAreAllReported() throws Exception {
        Template t = Fixtures.templateV1();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> t.budgetFor(Map.of("T_tank", 55.0, "m_nett", 3.0, "V_meter", 10.0)));
        assertTrue(e.getMessage().contains("'m_nett' is not a parameter"), e.getMessage());
        assertTrue(e.getMessage().contains("'m_net' has no default"), e.getMessage());
        assertTrue(e.getMessage().contains("'T_tank' = 55.0 lies outside its allowed range [5.0, 40.0]"),
                e.getMessage());
    }

    @Test
    void lockedFieldsThatWereChangedAreReported() throws Exception {
        Template t = Fixtures.templateV1();
        BudgetDocument d = t.instantiate(RUN, "Ash Penrose", Fixtures.T0);
        InputQuantity rho = d.budget().input("rho_20");
        List<String> v = t.spec().lockViolations(t.document().budget(), d.budget().withModel("E = 0")
                .withInput("rho_20", rho.withSource("my own guess")));
        assertEquals(2, v.size(), v.toString());
        assertTrue(v.get(0).startsWith("locked field 'model' (locked by template tvfl-gravimetric-water v1)"), v.get(0));
        assertTrue(v.get(0).endsWith("budget value E = 0"), v.get(0));
        assertTrue(v.get(1).startsWith("locked field 'rho_20.source'"), v.get(1));
        assertTrue(v.get(1).endsWith("budget value my own guess"), v.get(1));
    }

    @Test
    void theLibrarySearchesShippedPersonalAndTeamFoldersInOrder(@TempDir Path dir) throws Exception {
        Path shipped = Files.createDirectories(dir.resolve("shipped"));
        Path personal = Files.createDirectories(dir.resolve("personal"));
        Path team = Files.createDirectories(dir.resolve("team"));
        Files.writeString(shipped.resolve("grav-v1.json"), Fixtures.text("tvfl-gravimetric-water-v1.json"));
        Files.writeString(team.resolve("grav-v2.json"), Fixtures.text("tvfl-gravimetric-water-v2.json"));
        Files.writeString(personal.resolve("meter.json"), Fixtures.text("tvfl-meter-tv0412-v1.json"));
        Files.writeString(personal.resolve("notes.json"), "{ not json");
        TemplateLibrary lib = TemplateLibrary.of(shipped, personal, team.resolve("missing").getParent());
        TemplateLibrary.Listing l = lib.list();
        assertEquals(2, l.templates().size());
        assertEquals(TemplateLibrary.Folder.SHIPPED, l.templates().get(0).folder());
        assertEquals(TemplateLibrary.Folder.TEAM, l.templates().get(1).folder());
        assertEquals(2, l.problems().size(), l.problems().toString());
        assertEquals(2, lib.find("tvfl-gravimetric-water").orElseThrow().template().version());
        assertTrue(lib.find("tvfl-none").isEmpty());
        assertEquals(2, lib.search("GRAVIMETRIC").size());
        assertEquals(0, lib.search("ultrasonic").size());
        assertEquals(0, TemplateLibrary.of(null, dir.resolve("none"), null).list().templates().size());
    }

    @Test
    void comparingWithANewerTemplateListsItsChangesButNotTheUsersParameterValues() throws Exception {
        BudgetDocument d = Fixtures.templateV1().instantiate(RUN, "Ash Penrose", Fixtures.T0);
        Template v2 = Fixtures.templateV2();
        List<TemplateChange> c = TemplateLibrary.compare(d, v2);
        Set<String> found = c.stream().map(x -> x.kind() + " " + x.subject()).collect(Collectors.toSet());
        assertEquals(Set.of("MODEL_CHANGED model", "SOURCE_CHANGED rho_20", "EVALUATION_CHANGED delta_div",
                "SOURCE_CHANGED delta_div", "INPUT_ADDED delta_evap"), found);
        BudgetDocument own = d.withBudget(d.budget().withInput("k_b", d.budget().input("k_b").withEvaluation(
                ((org.quire.engine.budget.TypeB) d.budget().input("k_b").evaluation()).with("estimate", 1.00110))),
                "Ash Penrose", Fixtures.T0);
        assertTrue(TemplateLibrary.compare(own, v2).stream().anyMatch(x -> x.kind()
                == TemplateChange.Kind.ESTIMATE_CHANGED && x.subject().equals("k_b")));
    }

    @Test
    void adoptingSomeChangesKeepsTheOldOriginAndAdoptingAllRecordsTheNewTemplate() throws Exception {
        BudgetDocument d = Fixtures.templateV1().instantiate(RUN, "Ash Penrose", Fixtures.T0);
        Template v2 = Fixtures.templateV2();
        List<TemplateChange> c = TemplateLibrary.compare(d, v2);
        TemplateChange added = c.stream().filter(x -> x.kind() == TemplateChange.Kind.INPUT_ADDED).findFirst()
                .orElseThrow();
        BudgetDocument some = TemplateLibrary.adopt(d, v2, List.of(added), "Ash Penrose", Fixtures.T0);
        assertEquals("delta_evap", some.budget().inputs().get(7).name());
        assertEquals(1, some.templateOrigin().version());
        assertEquals(c.size() - 1, TemplateLibrary.compare(some, v2).size());
        BudgetDocument all = TemplateLibrary.adopt(d, v2, c, "Ash Penrose", Fixtures.T0);
        assertTrue(TemplateLibrary.compare(all, v2).isEmpty());
        assertEquals(v2.origin(), all.templateOrigin());
        assertEquals(99.87, all.budget().input("m_net").evaluation().estimate());
        assertThrows(IllegalArgumentException.class, () -> TemplateLibrary.adopt(all, v2, List.of(added),
                "Ash Penrose", Fixtures.T0));
    }

    @Test
    void publishingToTheTeamFolderChecksCompletenessAndNamesTheAuthor(@TempDir Path dir) throws Exception {
        Path team = Files.createDirectories(dir.resolve("team"));
        TemplateLibrary lib = TemplateLibrary.of(null, null, team);
        BudgetDocument t = Fixtures.templateV1().document();
        BudgetDocument incomplete = t.withBudget(t.budget().withTitle(" ").withInput("k_b",
                t.budget().input("k_b").withSource("")), "Wren Halloway", Fixtures.T0);
        IncompleteTemplateException e = assertThrows(IncompleteTemplateException.class,
                () -> lib.publishToTeam(incomplete, "", Fixtures.T0));
        assertEquals(3, e.problems().size(), e.problems().toString());
        Instant when = Instant.parse("2026-03-09T16:00:00Z");
        Path f = lib.publishToTeam(t, "Corin Blackwood", when);
        assertEquals("tvfl-gravimetric-water-v1.json", f.getFileName().toString());
        BudgetDocument back = DocumentStore.open(f);
        assertEquals("Corin Blackwood", back.author());
        assertEquals(when, back.modified());
        assertEquals(t.budget(), back.budget());
        DocumentSaveException again = assertThrows(DocumentSaveException.class,
                () -> lib.publishToTeam(t, "Corin Blackwood", when));
        assertTrue(again.getMessage().contains("raise the version"), again.getMessage());
        Path teamIsAFile = dir.resolve("team-share");
        Files.writeString(teamIsAFile, "");
        DocumentSaveException ro = assertThrows(DocumentSaveException.class,
                () -> TemplateLibrary.of(null, null, teamIsAFile).publishToTeam(t, "Corin Blackwood", when));
        assertTrue(ro.getMessage().contains(teamIsAFile.toAbsolutePath().toString()), ro.getMessage());
        assertFalse(Files.exists(teamIsAFile.resolve("x")));
    }
}
