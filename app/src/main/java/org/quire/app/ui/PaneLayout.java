package org.quire.app.ui;

import org.quire.app.ui.common.WorkbenchPrefs;
import java.awt.Component;
import javax.swing.JSplitPane;

/**
 * The three hideable panes (navigator, inspector, problems) and their divider positions, remembered in the
 * preferences as "navigatorWidth,inspectorWidth,problemsHeight,navigatorShown,inspectorShown,problemsShown".
 */
final class PaneLayout {
    /** A pane that can be hidden. */
    enum Pane { NAVIGATOR, INSPECTOR, PROBLEMS }

    private final JSplitPane main;
    private final JSplitPane centre;
    private final JSplitPane vertical;
    private final WorkbenchPrefs prefs;
    private int navigatorWidth = 230;
    private int inspectorWidth = 340;
    private int problemsHeight = 130;
    /** The centre split's width when the inspector was last placed in it. */
    private int centreWidth;
    /** Whether the divider is being placed here (not moved by the user). */
    private boolean placing;
    /** The problems pane shrunk to its title line (nothing to list); its height in pixels then, else 0. */
    private int collapsedTo;

    PaneLayout(JSplitPane main, JSplitPane centre, JSplitPane vertical, WorkbenchPrefs prefs) {
        this.main = main;
        this.centre = centre;
        this.vertical = vertical;
        this.prefs = prefs;
        for (JSplitPane s : new JSplitPane[] {main, centre, vertical}) {
            s.setContinuousLayout(true);
            s.setOneTouchExpandable(false);
        }
        // the inspector keeps its width when the window's width changes (start-up included, where the split may be
        // laid out at a passing width before the window has its own); a divider moved at a steady width (by the
        // user) sets the width it keeps
        centre.addComponentListener(new java.awt.event.ComponentAdapter() {
            @Override
            public void componentResized(java.awt.event.ComponentEvent e) {
                int w = centre.getWidth();
                if (w > 0 && w != centreWidth) {
                    centreWidth = w;
                    if (isShown(Pane.INSPECTOR)) {
                        placeInspector();
                    }
                }
            }
        });
        centre.addPropertyChangeListener(JSplitPane.DIVIDER_LOCATION_PROPERTY, e -> {
            // a move at a steady width, not made here: the user's
            if (!placing && centre.getWidth() > 0 && centre.getWidth() == centreWidth && isShown(Pane.INSPECTOR)) {
                inspectorWidth = centre.getWidth() - centre.getDividerLocation();
            }
        });
        // the split's height is known only once the window is laid out (and changes with it): the problems pane
        // keeps its title line's height while it has nothing to list, and gets its remembered height at first
        vertical.addComponentListener(new java.awt.event.ComponentAdapter() {
            private int laidOut;

            @Override
            public void componentResized(java.awt.event.ComponentEvent e) {
                int h = vertical.getHeight();
                if (h > 0 && isShown(Pane.PROBLEMS) && (collapsedTo > 0 || laidOut == 0)) {
                    int bottom = collapsedTo > 0 ? collapsedTo + vertical.getDividerSize() : problemsHeight;
                    vertical.setDividerLocation(Math.max(200, h - bottom));
                }
                laidOut = h;
            }
        });
    }

    boolean isShown(Pane p) {
        return component(p).isVisible();
    }

    void setShown(Pane p, boolean on) {
        remember();
        component(p).setVisible(on);
        apply();
    }

    private Component component(Pane p) {
        switch (p) {
            case NAVIGATOR: return main.getLeftComponent();
            case INSPECTOR: return centre.getRightComponent();
            default: return vertical.getBottomComponent();
        }
    }

    private void remember() {
        if (isShown(Pane.NAVIGATOR) && main.getDividerLocation() > 0) {
            navigatorWidth = main.getDividerLocation();
        }
        // the inspector's width is not read back here: the divider listener keeps the width the user set, and a
        // window too narrow for it (the notebook held at its least width) must not shrink what is remembered
        if (isShown(Pane.PROBLEMS) && collapsedTo == 0 && vertical.getHeight() > 0) {
            problemsHeight = vertical.getHeight() - vertical.getDividerLocation();
        }
    }

    private void apply() {
        main.setDividerLocation(navigatorWidth);
        placeInspector();
        int bottom = collapsedTo > 0 ? collapsedTo + vertical.getDividerSize() : problemsHeight;
        vertical.setDividerLocation(Math.max(200, vertical.getHeight() - bottom));
        main.revalidate();
    }

    private void placeInspector() {
        placing = true;
        try {
            centre.setDividerLocation(Math.max(200, centre.getWidth() - inspectorWidth));
        } finally {
            placing = false;
        }
    }

    /**
     * Shrinks the problems pane to its title line when there is nothing to list, and gives it its height again
     * when there is.
     *
     * @param height the title line's height, or 0 to give the pane its height
     */
    void collapseProblems(int height) {
        if ((collapsedTo > 0) == (height > 0)) {
            return;
        }
        if (vertical.getHeight() == 0) {
            collapsedTo = height; // not laid out yet: restore() applies it
            return;
        }
        if (isShown(Pane.PROBLEMS) && collapsedTo == 0) {
            problemsHeight = vertical.getHeight() - vertical.getDividerLocation();
        }
        collapsedTo = height;
        int bottom = collapsedTo > 0 ? collapsedTo + vertical.getDividerSize() : problemsHeight;
        vertical.setDividerLocation(Math.max(200, vertical.getHeight() - bottom));
    }

    /** @return whether the problems pane is shrunk to its title line */
    boolean problemsCollapsed() {
        return collapsedTo > 0;
    }

    void restore() {
        String[] v = prefs.paneLayout().split(",");
        if (v.length == 6) {
            try {
                navigatorWidth = Integer.parseInt(v[0]);
                inspectorWidth = Integer.parseInt(v[1]);
                problemsHeight = Integer.parseInt(v[2]);
                main.getLeftComponent().setVisible(Boolean.parseBoolean(v[3]));
                centre.getRightComponent().setVisible(Boolean.parseBoolean(v[4]));
                vertical.getBottomComponent().setVisible(Boolean.parseBoolean(v[5]));
            } catch (NumberFormatException e) {
                // a damaged entry: the default layout is used
            }
        }
        main.validate();
        apply();
    }

    void save() {
        remember();
        prefs.setPaneLayout(navigatorWidth + "," + inspectorWidth + "," + problemsHeight + "," + isShown(Pane.NAVIGATOR)
                + "," + isShown(Pane.INSPECTOR) + "," + isShown(Pane.PROBLEMS));
    }
}
