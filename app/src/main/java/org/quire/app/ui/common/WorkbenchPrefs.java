package org.quire.app.ui.common;

import java.awt.GraphicsEnvironment;
import java.awt.Rectangle;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.prefs.Preferences;
import org.quire.engine.budget.EvaluationSettings;

/**
 * The workbench's preferences: one node, named keys, typed getters with defaults. New budgets take their
 * evaluation settings from here; a budget's own settings travel in its file.
 *
 * <p>Not thread-safe; use on the event thread.
 */
public final class WorkbenchPrefs {
    /** The node the workbench uses unless told otherwise. */
    public static final String NODE = "org/quire/workbench";

    static final String THEME = "theme";
    static final String COVERAGE_PROBABILITY = "coverageProbability";
    static final String COVERAGE_FACTOR = "coverageFactor";
    static final String SIGNIFICANT_DIGITS = "significantDigits";
    static final String TRIALS = "trials";
    static final String SEED = "seed";
    static final String BUDGET_FOLDERS = "budgetFolders";
    static final String PERSONAL_TEMPLATES = "personalTemplateFolder";
    static final String TEAM_TEMPLATES = "teamTemplateFolder";
    static final String RECOVERY_FOLDER = "recoveryFolder";
    static final String USER_NAME = "userName";
    static final String AUTOSAVE_MINUTES = "autosaveMinutes";
    static final String RECENT = "recentFiles";
    static final String BOUNDS = "windowBounds";
    static final String MAXIMIZED = "windowMaximized";
    static final String LAYOUT = "paneLayout";
    private static final int RECENT_LIMIT = 8;
    private static final String SEP = "\n";

    /** Light or dark look. */
    public enum Theme { LIGHT, DARK }

    private final Preferences node;

    public WorkbenchPrefs(Preferences node) {
        this.node = node;
    }

    /** @return the preferences of the user running the workbench */
    public static WorkbenchPrefs user() {
        return new WorkbenchPrefs(Preferences.userRoot().node(NODE));
    }

    public Preferences node() { return node; }

    public Theme theme() {
        return "dark".equals(node.get(THEME, "light")) ? Theme.DARK : Theme.LIGHT;
    }

    public void setTheme(Theme t) { node.put(THEME, t == Theme.DARK ? "dark" : "light"); }

    /** @return the evaluation settings new budgets start with */
    public EvaluationSettings newBudgetSettings() {
        EvaluationSettings s = EvaluationSettings.defaults()
                .withCoverageProbability(node.getDouble(COVERAGE_PROBABILITY, EvaluationSettings.DEFAULT_COVERAGE))
                .withSignificantDigits(node.getInt(SIGNIFICANT_DIGITS, 2))
                .withTrials(node.getLong(TRIALS, EvaluationSettings.DEFAULT_TRIALS))
                .withSeed(node.getLong(SEED, EvaluationSettings.DEFAULT_SEED));
        double k = node.getDouble(COVERAGE_FACTOR, Double.NaN);
        return Double.isNaN(k) ? s : s.withCoverageFactor(k);
    }

    /** Stores the settings new budgets start with (already checked by {@link EvaluationSettings}). */
    public void setNewBudgetSettings(EvaluationSettings s) {
        node.putDouble(COVERAGE_PROBABILITY, s.coverageProbability());
        if (s.hasFixedCoverageFactor()) {
            node.putDouble(COVERAGE_FACTOR, s.coverageFactor());
        } else {
            node.remove(COVERAGE_FACTOR);
        }
        node.putInt(SIGNIFICANT_DIGITS, s.significantDigits());
        node.putLong(TRIALS, s.trials());
        node.putLong(SEED, s.seed());
    }

    public List<Path> budgetFolders() { return paths(BUDGET_FOLDERS); }
    public void setBudgetFolders(List<Path> p) { putPaths(BUDGET_FOLDERS, p); }
    /** @return the user's own template folder, or null when none is set */
    public Path personalTemplates() { return path(PERSONAL_TEMPLATES); }
    /** @return the team's shared (possibly read-only) template folder, or null when none is set */
    public Path teamTemplates() { return path(TEAM_TEMPLATES); }
    public void setPersonalTemplates(Path p) { putPath(PERSONAL_TEMPLATES, p); }
    public void setTeamTemplates(Path p) { putPath(TEAM_TEMPLATES, p); }

    /** @return where copies of changed budgets are kept until they are saved: {@code ~/.quire/recovery} by default */
    public Path recoveryFolder() {
        Path p = path(RECOVERY_FOLDER);
        return p != null ? p : Path.of(System.getProperty("user.home"), ".quire", "recovery");
    }

    public void setRecoveryFolder(Path p) { putPath(RECOVERY_FOLDER, p); }

    /** @return the name recorded in revision histories and review decisions: the login name unless set */
    public String userName() {
        String n = node.get(USER_NAME, "").strip();
        return n.isEmpty() ? System.getProperty("user.name", "unknown user") : n;
    }

    public void setUserName(String n) {
        if (n == null || n.isBlank()) {
            node.remove(USER_NAME);
        } else {
            node.put(USER_NAME, n.strip());
        }
    }

    /** @return minutes between copies of changed budgets into the recovery folder; 0 for never */
    public int autosaveMinutes() { return node.getInt(AUTOSAVE_MINUTES, 1); }

    public void setAutosaveMinutes(int m) {
        if (m < 0 || m > 120) {
            throw new IllegalArgumentException("autosave interval must be 0 (never) to 120 minutes, not " + m);
        }
        node.putInt(AUTOSAVE_MINUTES, m);
    }

    public List<Path> recentFiles() { return paths(RECENT); }

    /** Puts {@code file} first in the recent files. */
    public void addRecent(Path file) {
        List<Path> list = new ArrayList<>(recentFiles());
        list.remove(file);
        list.add(0, file);
        putPaths(RECENT, list.subList(0, Math.min(RECENT_LIMIT, list.size())));
    }

    /** @return the saved window bounds moved and shrunk to fit the screens now attached, or null */
    public Rectangle windowBounds() {
        String[] v = node.get(BOUNDS, "").split(",");
        if (v.length != 4) {
            return null;
        }
        try {
            Rectangle r = new Rectangle(Integer.parseInt(v[0]), Integer.parseInt(v[1]), Integer.parseInt(v[2]),
                    Integer.parseInt(v[3]));
            return clamp(r, GraphicsEnvironment.getLocalGraphicsEnvironment().getMaximumWindowBounds());
        } catch (NumberFormatException e) {
            return null;
        }
    }

    /** @return {@code r} moved and shrunk so that it lies within {@code screen} */
    static Rectangle clamp(Rectangle r, Rectangle screen) {
        int w = Math.max(640, Math.min(r.width, screen.width));
        int h = Math.max(420, Math.min(r.height, screen.height));
        int x = Math.max(screen.x, Math.min(r.x, screen.x + screen.width - w));
        int y = Math.max(screen.y, Math.min(r.y, screen.y + screen.height - h));
        return new Rectangle(x, y, Math.min(w, screen.width), Math.min(h, screen.height));
    }

    public void setWindowBounds(Rectangle r, boolean maximized) {
        node.put(BOUNDS, r.x + "," + r.y + "," + r.width + "," + r.height);
        node.putBoolean(MAXIMIZED, maximized);
    }

    public boolean windowMaximized() { return node.getBoolean(MAXIMIZED, false); }

    /** @return the remembered pane layout (see {@code PaneLayout}), or "" */
    public String paneLayout() { return node.get(LAYOUT, ""); }
    public void setPaneLayout(String s) { node.put(LAYOUT, s); }

    private Path path(String key) {
        String s = node.get(key, "").strip();
        if (s.isEmpty()) {
            return null;
        }
        try {
            return Path.of(s);
        } catch (java.nio.file.InvalidPathException e) {
            return null;
        }
    }

    private void putPath(String key, Path p) {
        if (p == null) {
            node.remove(key);
        } else {
            node.put(key, p.toAbsolutePath().toString());
        }
    }

    private List<Path> paths(String key) {
        List<Path> out = new ArrayList<>();
        for (String s : node.get(key, "").split(SEP)) {
            if (!s.isBlank()) {
                try {
                    out.add(Path.of(s));
                } catch (java.nio.file.InvalidPathException e) {
                    // a path from another system; skipped
                }
            }
        }
        return out;
    }

    private void putPaths(String key, List<Path> paths) {
        StringBuilder b = new StringBuilder();
        for (Path p : paths) {
            b.append(p.toAbsolutePath()).append(SEP);
        }
        node.put(key, b.toString());
    }
}
