package org.quire.app.cli;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.quire.app.Engine;
import org.quire.app.compare.BudgetComparison;
import org.quire.app.compare.Comparison;
import org.quire.app.compare.ComparisonText;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentStatus;
import org.quire.engine.document.RevisionEntry;

/**
 * {@code quire diff A B}: what differs from budget A to B; {@code quire diff FILE --revision N}: what differs from
 * approved revision N of a document (read back from its history) to its current content. Exit 0 when identical,
 * 1 when they differ.
 */
final class DiffCommand {
    static final String USAGE = "quire diff A B | quire diff FILE --revision N";

    private DiffCommand() {
    }

    static int run(String[] argv, PrintStream out) throws Exception {
        Args a = new Args(argv, 1, Set.of("revision"), Set.of());
        if (a.has("revision")) {
            a.expectPositional(1, USAGE);
            return revision(a, out);
        }
        a.expectPositional(2, USAGE);
        String fa = a.positional().get(0);
        String fb = a.positional().get(1);
        BudgetDocument da = Files.loadDocument(fa);
        BudgetDocument db = Files.loadDocument(fb);
        Comparison c = BudgetComparison.compare(da.budget(), db.budget(), Engine.library());
        out.print(ComparisonText.format(c, fa, fb));
        boolean details = details(da, db, out);
        return c.identical() && !details ? 0 : 1;
    }

    private static int revision(Args a, PrintStream out) throws Exception {
        long n = a.integer("revision", 0);
        String file = a.positional().get(0);
        BudgetDocument doc = Files.loadDocument(file);
        if (n < 1 || n > Integer.MAX_VALUE) {
            throw new UsageException("--revision needs a revision number of 1 or more, not " + a.get("revision", ""));
        }
        Optional<BudgetDocument> approved = doc.approvedRevision((int) n);
        if (approved.isEmpty()) {
            List<String> revs = new ArrayList<>();
            for (RevisionEntry e : doc.history()) {
                if (e.status() == DocumentStatus.APPROVED && !revs.contains(Integer.toString(e.revision()))) {
                    revs.add(Integer.toString(e.revision()));
                }
            }
            throw new Files.FileProblem(file, "revision " + n + " was never approved, so its content is not kept; "
                    + (revs.isEmpty() ? "no revision of this document has been approved"
                            : "approved revisions: " + String.join(", ", revs)));
        }
        BudgetDocument old = approved.get();
        Comparison c = BudgetComparison.compare(old.budget(), doc.budget(), Engine.library());
        String nameA = file + ", approved revision " + n + " (" + old.contentHash().substring(0, 16) + "…)";
        String nameB = file + ", revision " + doc.revision() + ", " + doc.status().label() + " ("
                + doc.contentHash().substring(0, 16) + "…)";
        out.print(ComparisonText.format(c, nameA, nameB));
        boolean details = details(old, doc, out);
        return c.identical() && !details ? 0 : 1;
    }

    /** Prints changes of laboratory, device under test and author; @return whether any changed */
    private static boolean details(BudgetDocument a, BudgetDocument b, PrintStream out) {
        List<String> lines = new ArrayList<>();
        field(lines, "laboratory", a.laboratory(), b.laboratory());
        field(lines, "device under test", a.deviceUnderTest(), b.deviceUnderTest());
        field(lines, "author", a.author(), b.author());
        if (!lines.isEmpty()) {
            out.println();
            out.println("Document details changed:");
            lines.forEach(out::println);
        }
        return !lines.isEmpty();
    }

    private static void field(List<String> lines, String name, String a, String b) {
        if (!a.equals(b)) {
            lines.add("  " + name + ": '" + a + "' -> '" + b + "'");
        }
    }
}
