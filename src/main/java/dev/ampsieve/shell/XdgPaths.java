package dev.ampsieve.shell;

import java.nio.file.Path;
import java.util.Map;

/**
 * Where the shell keeps its history, after the XDG Base Directory Specification (0.8):
 * {@code $XDG_DATA_HOME/ampsieve/history}, else {@code ~/.local/share/ampsieve/history}.
 * The specification says a relative path in the variable is invalid and must be ignored.
 */
final class XdgPaths {
    private XdgPaths() {}

    static Path history(Map<String, String> env, String userHome) {
        String data = env.get("XDG_DATA_HOME");
        Path base = data != null && !data.isBlank() && Path.of(data).isAbsolute()
                ? Path.of(data)
                : Path.of(userHome, ".local", "share");
        return base.resolve("ampsieve").resolve("history");
    }
}
