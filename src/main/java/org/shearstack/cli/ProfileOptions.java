package org.shearstack.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.shearstack.profile.Profiles;
import picocli.CommandLine.Option;

/** The shared {@code --profiles DIR} option (mixin): a user profile folder over the shipped one. */
public final class ProfileOptions {

    @Option(names = "--profiles", paramLabel = "DIR",
            description = "User profile folder (printers/, filaments/, ...); default ~/.shearstack/profiles if present.")
    Path profilesDir;

    /** The user folder to use: the option, else ~/.shearstack/profiles when it exists. */
    public Optional<Path> userDir() {
        if (profilesDir != null) {
            return Optional.of(profilesDir);
        }
        String home = System.getProperty("user.home");
        if (home == null) {
            return Optional.empty();
        }
        Path p = Path.of(home, ".shearstack", "profiles");
        return Files.isDirectory(p) ? Optional.of(p) : Optional.empty();
    }

    /** Shipped profiles extended by the user folder. */
    public Profiles load() {
        Optional<Path> dir = userDir();
        if (dir.isPresent() && !Files.isDirectory(dir.get())) {
            throw new org.shearstack.spec.BadInputException(java.util.List.of(new org.shearstack.spec.Problem(
                    dir.get().toString(), 0, 0, "--profiles", "a folder of profiles", "no such folder", "")));
        }
        return Profiles.load(dir);
    }
}
