package dev.sheaf.miner.cli;

import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import java.util.List;

@Command(name = "label", description = "Label every listing with the vocabulary and export the labels.", mixinStandardHelpOptions = true)
final class LabelCommand extends NotBuiltYet {
    @Parameters(arity = "0..*", hidden = true)
    List<String> args;
}
