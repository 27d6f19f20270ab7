package dev.sheaf.miner.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** Base of a command that is planned but not built: says so plainly and exits non-zero. */
abstract class NotBuiltYet implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        spec.commandLine().getErr().printf(
                "sheaf %s: not built yet in this version of Sheaf; see README.md for what works today.%n",
                spec.name());
        return ExitCodes.NOT_AVAILABLE;
    }
}
