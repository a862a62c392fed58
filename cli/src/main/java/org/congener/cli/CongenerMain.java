package org.congener.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** Entry point of {@code ./congener}; each job is a subcommand in its own class. */
@Command(name = "congener",
        mixinStandardHelpOptions = true,
        version = "congener 0.1.0",
        description = "Streaming compound suggestions for research institutes.%n"
                + "Suggestions are no safety review: read the safety data sheet before use.",
        subcommands = {
                CommandLine.HelpCommand.class,
                DemoCommand.class,
                StreamsCommand.class,
                EvaluateCommand.class,
                SimilarityCommand.class,
                OntologyStatsCommand.class,
                TrainCommand.class,
                ModelsCommand.class,
                RollbackCommand.class,
        })
public final class CongenerMain {

    public static void main(String[] args) {
        System.exit(run(args));
    }

    /** Runs a command line and returns its exit code; tests call this instead of {@link #main}. */
    public static int run(String... args) {
        CommandLine commandLine = new CommandLine(new CongenerMain());
        commandLine.setParameterExceptionHandler(CliErrors::badCommandLine);
        commandLine.setExecutionExceptionHandler(CliErrors::failed);
        return commandLine.execute(args);
    }
}
