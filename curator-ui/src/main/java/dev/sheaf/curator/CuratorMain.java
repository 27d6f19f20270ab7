package dev.sheaf.curator;

import dev.sheaf.curator.app.CuratorApp;
import dev.sheaf.miner.cli.ExitCodes;
import dev.sheaf.miner.ingest.Workspace;
import java.nio.file.Files;
import java.nio.file.Path;
import javafx.application.Application;

/** Starts the desktop curator: {@code ./sheaf curate [WORKSPACE]}. */
public final class CuratorMain {
    static final String HELP = String.join("\n",
            "Usage: sheaf curate [WORKSPACE]",
            "Open the desktop curator: triage the harvest (keep, drop, park), read the evidence, build the vocabulary.",
            "",
            "  WORKSPACE   a folder with a workspace.json (e.g. sample-listings); without it, use File > Open workspace.",
            "              When the workspace has no harvest yet, the listings are mined in the background first;",
            "              when it has no vocabulary file yet, a new one is started.",
            "",
            "Keys: K keep, Shift+K keep as a label of the selected concept, D drop, P park, U forget the decision,",
            "      Ctrl+Z undo, Ctrl+Shift+Z redo, Ctrl+S save, Ctrl+F filter, F1 all keys.",
            "Every edit is written to an edit journal at once; unsaved edits come back when the workspace is opened again.",
            "Needs a display; on a machine without one: xvfb-run -a ./sheaf curate WORKSPACE",
            "",
            "Exit codes: 0 closed normally, 2 usage (not a workspace folder), 5 no display available.");

    private CuratorMain() {
    }

    public static void main(String[] args) {
        if (args.length > 0 && (args[0].equals("--help") || args[0].equals("-h"))) {
            System.out.println(HELP);
            return;
        }
        if (args.length > 1) {
            System.err.println("sheaf curate: give at most one WORKSPACE folder, got " + args.length + " arguments");
            System.err.println("Try 'sheaf curate --help'.");
            System.exit(ExitCodes.USAGE);
        }
        if (args.length == 1) {
            Path dir = Path.of(args[0]);
            if (!Files.isDirectory(dir) || !Workspace.isWorkspace(dir)) {
                System.err.println("sheaf curate: '" + args[0] + "' is not a workspace folder (no " + Workspace.FILE_NAME
                        + " in it); give a folder like sample-listings, or start without one and use File > Open workspace");
                System.exit(ExitCodes.USAGE);
            }
        }
        try {
            Application.launch(CuratorApp.class, args);
        } catch (UnsupportedOperationException | IllegalStateException e) {
            System.err.println("sheaf curate: cannot open a window (" + e.getMessage() + "); the curator needs a display."
                    + " Without one, run it as: xvfb-run -a ./sheaf curate " + (args.length == 1 ? args[0] : ""));
            System.exit(ExitCodes.NOT_AVAILABLE);
        }
    }
}
