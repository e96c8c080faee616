package org.quire.engine.document;

import java.nio.file.Path;

/** A helper program for {@link RecoverySessionsTest}: claims a session, keeps a copy in it and waits to be killed. */
public final class RecoverySessionHolder {
    private RecoverySessionHolder() {
    }

    public static void main(String[] args) throws Exception {
        RecoverySessions.Session s = RecoverySessions.in(Path.of(args[0])).claim();
        s.store().autosave("held", BudgetDocument.newDraft(Fixtures.sumBudget(2, 1), "Wren Halloway", Fixtures.T0),
                null);
        System.out.println("holding");
        System.out.flush();
        Thread.sleep(60_000);
    }
}
