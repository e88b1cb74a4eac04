package org.holdfast.schema;

import java.nio.file.Files;
import java.nio.file.Path;

import org.tomlj.Toml;
import org.tomlj.TomlParseError;
import org.tomlj.TomlParseResult;

import org.holdfast.schema.ScenarioException;
import org.holdfast.schema.NumberReader;
import org.holdfast.schema.Overrides;
import org.holdfast.schema.Node;
import org.holdfast.schema.InputText;

/**
 * Opens a TOML scenario file and hands out its root {@link Node}. Syntax errors are reported
 * with the file and line of the first one; the readers of each section do the rest.
 */
public final class ScenarioFile {

    private ScenarioFile() {
    }

    /** Parses a file with plain numbers and the given overrides. */
    public static Node open(Path file, Overrides overrides) {
        return open(file, overrides, NumberReader.PLAIN);
    }

    /**
     * Parses a file.
     *
     * @throws ScenarioException if the file cannot be read or is not valid TOML
     */
    public static Node open(Path file, Overrides overrides, NumberReader numbers) {
        if (!Files.isRegularFile(file)) {
            throw new ScenarioException(file.toString(), null, "no such scenario file");
        }
        String text = InputText.read(file, "scenario file");
        return parse(file, text, overrides, numbers);
    }

    /** Parses TOML text as if it came from {@code file}. */
    public static Node parse(Path file, String text, Overrides overrides, NumberReader numbers) {
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        InputText.checkToml(file, text);
        TomlParseResult result;
        try {
            result = Toml.parse(text);
        } catch (StackOverflowError e) {
            throw new ScenarioException(file.toString(), null, "TOML nested too deeply to read");
        }
        if (result.hasErrors()) {
            TomlParseError e = result.errors().get(0);
            throw new ScenarioException(file + ":" + e.position().line(), null, "TOML syntax: " + e.getMessage());
        }
        return new Node(file, result, "", null, overrides, numbers);
    }
}
