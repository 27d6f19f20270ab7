package dev.sheaf.miner.cli;

import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import java.util.List;

@Command(name = "agreement", description = "Measure annotator agreement per attribute (Krippendorff's alpha, Fleiss' kappa).", mixinStandardHelpOptions = true)
final class AgreementCommand extends NotBuiltYet {
    @Parameters(arity = "0..*", hidden = true)
    List<String> args;
}
