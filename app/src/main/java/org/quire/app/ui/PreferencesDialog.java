package org.quire.app.ui;

import org.quire.app.ui.common.WorkbenchPrefs;
import org.quire.app.ui.common.Fmt;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import org.quire.engine.budget.EvaluationSettings;

/**
 * The preferences: coverage probability or k, significant digits, Monte Carlo trials and seed for new budgets;
 * theme; budget folders, personal and team template folders; your name; how often copies of changed
 * budgets go to the recovery folder, and where it is. Values are checked by the engine's settings before
 * they are stored; a refused value is named and nothing is stored.
 */
final class PreferencesDialog {
    private PreferencesDialog() {
    }

    static void show(WorkbenchFrame frame) {
        WorkbenchPrefs prefs = frame.prefs();
        EvaluationSettings s = prefs.newBudgetSettings();
        JTextField p = new JTextField(Fmt.probability(s.coverageProbability()).replace(" %", ""), 8);
        JTextField k = new JTextField(s.hasFixedCoverageFactor() ? Fmt.num(s.coverageFactor()) : "", 8);
        JTextField digits = new JTextField(String.valueOf(s.significantDigits()), 3);
        JTextField trials = new JTextField(String.valueOf(s.trials()), 10);
        JTextField seed = new JTextField(String.valueOf(s.seed()), 12);
        JComboBox<String> theme = new JComboBox<>(new String[] {"Light", "Dark"});
        theme.setSelectedIndex(prefs.theme() == WorkbenchPrefs.Theme.DARK ? 1 : 0);
        JTextArea budgets = folders(prefs.budgetFolders());
        JTextField personal = new JTextField(text(prefs.personalTemplates()), 30);
        JTextField team = new JTextField(text(prefs.teamTemplates()), 30);
        JTextField autosave = new JTextField(String.valueOf(prefs.autosaveMinutes()), 4);
        JTextField recovery = new JTextField(prefs.recoveryFolder().toString(), 30);
        JTextField user = new JTextField(prefs.userName(), 20);
        JPanel form = new JPanel(new GridBagLayout());
        GridBagConstraints c = new GridBagConstraints();
        c.insets = new Insets(3, 3, 3, 8);
        c.anchor = GridBagConstraints.WEST;
        c.gridy = 0;
        row(form, c, "Coverage probability for new budgets (%)", p);
        row(form, c, "or a fixed coverage factor k (blank: from \u03bd_eff)", k);
        row(form, c, "Significant digits of uncertainties (1-4)", digits);
        row(form, c, "Monte Carlo trials", trials);
        row(form, c, "Monte Carlo seed", seed);
        row(form, c, "Theme (applies on the next start)", theme);
        row(form, c, "Budget folders (one a line)", new JScrollPane(budgets));
        row(form, c, "Personal template folder", personal);
        row(form, c, "Team template folder", team);
        row(form, c, "Your name (recorded in revision histories)", user);
        row(form, c, "Keep copies of changed budgets every (minutes, 0 = never)", autosave);
        row(form, c, "Recovery folder (applies on the next start)", recovery);
        while (true) {
            int a = JOptionPane.showConfirmDialog(frame, form, "Preferences", JOptionPane.OK_CANCEL_OPTION,
                    JOptionPane.PLAIN_MESSAGE);
            if (a != JOptionPane.OK_OPTION) {
                return;
            }
            try {
                EvaluationSettings n = EvaluationSettings.defaults()
                        .withCoverageProbability(Fmt.parse(p.getText()) / 100)
                        .withSignificantDigits(integer("significant digits", digits.getText()))
                        .withTrials(integer("trials", trials.getText()))
                        .withSeed(Long.parseLong(seed.getText().trim()));
                if (!k.getText().isBlank()) {
                    n = n.withCoverageFactor(Fmt.parse(k.getText()));
                }
                int minutes = integer("autosave interval", autosave.getText());
                List<Path> b = paths(budgets.getText());
                Path pt = folder("personal template folder", personal.getText(), false);
                Path tt = folder("team template folder", team.getText(), false);
                Path rf = folder("recovery folder", recovery.getText(), true);
                if (user.getText().isBlank()) {
                    throw new IllegalArgumentException("your name must not be blank: it is recorded in revision "
                            + "histories");
                }
                prefs.setAutosaveMinutes(minutes);
                prefs.setNewBudgetSettings(n);
                prefs.setTheme(theme.getSelectedIndex() == 1 ? WorkbenchPrefs.Theme.DARK : WorkbenchPrefs.Theme.LIGHT);
                prefs.setBudgetFolders(b);
                prefs.setPersonalTemplates(pt);
                prefs.setTeamTemplates(tt);
                prefs.setRecoveryFolder(rf);
                prefs.setUserName(user.getText());
                frame.applyAutosave();
                frame.refreshNavigator();
                return;
            } catch (IllegalArgumentException e) {
                JOptionPane.showMessageDialog(frame, e.getMessage(), "Preferences not stored",
                        JOptionPane.ERROR_MESSAGE);
            }
        }
    }

    private static int integer(String what, String text) {
        try {
            return Integer.parseInt(text.trim());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(what + ": '" + text.trim() + "' is not a whole number");
        }
    }

    private static List<Path> paths(String text) {
        List<Path> out = new ArrayList<>();
        for (String line : text.split("\\R")) {
            if (!line.isBlank()) {
                Path p = Path.of(line.trim());
                if (!java.nio.file.Files.isDirectory(p)) {
                    throw new IllegalArgumentException("'" + line.trim() + "' is not a folder");
                }
                out.add(p);
            }
        }
        return out;
    }

    private static String text(Path p) {
        return p == null ? "" : p.toString();
    }

    /** @return the folder typed, null when blank; an existing folder unless {@code mayBeCreated} */
    private static Path folder(String what, String text, boolean mayBeCreated) {
        if (text.isBlank()) {
            if (mayBeCreated) {
                throw new IllegalArgumentException(what + " must be given");
            }
            return null;
        }
        Path p;
        try {
            p = Path.of(text.trim());
        } catch (java.nio.file.InvalidPathException e) {
            throw new IllegalArgumentException(what + ": '" + text.trim() + "' is not a path: " + e.getReason());
        }
        if (java.nio.file.Files.exists(p) ? !java.nio.file.Files.isDirectory(p) : !mayBeCreated) {
            throw new IllegalArgumentException(what + ": '" + text.trim() + "' is not a folder");
        }
        return p;
    }

    private static JTextArea folders(List<Path> paths) {
        StringBuilder s = new StringBuilder();
        paths.forEach(p -> s.append(p).append('\n'));
        return new JTextArea(s.toString(), 3, 30);
    }

    private static void row(JPanel form, GridBagConstraints c, String label, JComponent field) {
        c.gridy++;
        c.gridx = 0;
        c.fill = GridBagConstraints.NONE;
        form.add(new JLabel(label), c);
        c.gridx = 1;
        c.fill = GridBagConstraints.HORIZONTAL;
        form.add(field, c);
    }
}
