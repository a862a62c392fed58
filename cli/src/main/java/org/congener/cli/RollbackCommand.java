package org.congener.cli;

import java.util.concurrent.Callable;
import org.congener.schemas.ModelManifest;
import org.congener.trainer.publish.ModelPublisher;
import org.congener.trainer.publish.PublishHook;
import org.congener.trainer.publish.Rollback;
import org.congener.trainer.publish.VersionNames;
import org.congener.trainer.registry.PublishedModels;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** {@code congener rollback --to VERSION}: makes a kept older version live again. */
@Command(name = "rollback", mixinStandardHelpOptions = true,
        description = "Makes a published model version live again, after checking all its records are still there.")
public final class RollbackCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    TrainerConnection connection;

    @Option(names = "--to", required = true, paramLabel = "VERSION", description = "the version to make live, e.g. v0002")
    String version;

    @Override
    public Integer call() {
        if (!VersionNames.isVersion(version)) {
            throw new ParameterException(spec.commandLine(), "--to '" + version + "' is no version name (v0001, v0002, …)");
        }
        PublishedModels models = connection.registry(line -> spec.commandLine().getErr().println("rollback: " + line)).read();
        try (ModelPublisher publisher = new ModelPublisher(connection.bootstrapServers, connection.topics(),
                PublishHook.NONE)) {
            String before = models.liveVersion();
            ModelManifest live = Rollback.to(version, models, publisher);
            spec.commandLine().getOut().println("live version: " + live.version() + " (was " + (before == null ? "none" : before) + ")");
            return 0;
        } catch (IllegalArgumentException | IllegalStateException e) {
            spec.commandLine().getErr().println("congener rollback: " + e.getMessage());
            return CliErrors.FAILED;
        }
    }
}
