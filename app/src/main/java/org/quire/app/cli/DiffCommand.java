package org.quire.app.cli;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.quire.app.compare.BudgetComparison;
import org.quire.app.compare.Comparison;
import org.quire.app.compare.ComparisonText;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentStatus;
import org.quire.engine.document.RevisionEntry;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Parameters;

/**
 * {@code quire diff A B}: what differs from budget A to B; {@code quire diff FILE --revision N}: what differs from
 * approved revision N of a document (read back from its history) to its current content. Exit 0 when identical,
 * 1 when they differ.
 */
@Command(name = "diff", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"What changed from budget A to budget B, or from approved revision N of FILE to its current "
                + "content, and the effect of each change on every expanded uncertainty U.",
            "Exit status 0 when they are the same, 1 when they differ."},
        footerHeading = "%nExamples:%n",
        footer = {"  quire diff budget-2025.json budget-2026.json",
            "  quire diff budget.json --revision 2"})
final class DiffCommand implements Callable<Integer> {
    @ParentCommand
    QuireCommand quire;

    @Parameters(paramLabel = "FILE", arity = "1..2", description = "budgets A and B, or one document with --revision")
    List<String> files;

    @Option(names = "--revision", paramLabel = "N", converter = Options.WholeNumber.class,
            description = "compare approved revision N of FILE with its current content")
    Long revision;

    @Override
    public Integer call() throws Exception {
        PrintStream out = quire.out;
        if (revision != null) {
            if (files.size() != 1) {
                throw new UsageException("--revision N compares one document with its own history; give one FILE");
            }
            return revision(out);
        }
        if (files.size() != 2) {
            throw new UsageException("give two budgets A and B, or one FILE with --revision N");
        }
        String fa = files.get(0);
        String fb = files.get(1);
        BudgetDocument da = Files.loadDocument(fa);
        BudgetDocument db = Files.loadDocument(fb);
        Comparison c = BudgetComparison.compare(da.budget(), db.budget(), quire.engine.library());
        out.print(ComparisonText.format(c, fa, fb));
        boolean details = details(da, db, out);
        return c.identical() && !details ? 0 : 1;
    }

    private int revision(PrintStream out) throws Exception {
        long n = revision;
        String file = files.get(0);
        BudgetDocument doc = Files.loadDocument(file);
        if (n < 1 || n > Integer.MAX_VALUE) {
            throw new UsageException("--revision needs a revision number of 1 or more, not " + n);
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
        Comparison c = BudgetComparison.compare(old.budget(), doc.budget(), quire.engine.library());
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
