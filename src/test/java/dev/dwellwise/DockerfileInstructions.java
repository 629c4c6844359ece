package dev.dwellwise;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** A Dockerfile read as its instructions: comments dropped, continuation lines joined. */
record DockerfileInstructions(List<Instruction> all) {

    static final Path PATH = Path.of("Dockerfile");

    /** One instruction: the keyword in upper case and the rest of the line. */
    record Instruction(String keyword, String arguments) {
    }

    static DockerfileInstructions read() throws IOException {
        List<Instruction> instructions = new ArrayList<>();
        StringBuilder pending = new StringBuilder();
        for (String line : Files.readAllLines(PATH)) {
            String trimmed = line.strip();
            if (pending.length() == 0 && (trimmed.isEmpty() || trimmed.startsWith("#"))) {
                continue;
            }
            if (trimmed.endsWith("\\")) {
                pending.append(trimmed, 0, trimmed.length() - 1).append(' ');
                continue;
            }
            pending.append(trimmed);
            String text = pending.toString();
            pending.setLength(0);
            int space = text.indexOf(' ');
            instructions.add(new Instruction(text.substring(0, space).toUpperCase(Locale.ROOT),
                    text.substring(space + 1).strip()));
        }
        return new DockerfileInstructions(List.copyOf(instructions));
    }

    /** The instructions of the last stage, the image that runs. */
    List<Instruction> finalStage() {
        int from = 0;
        for (int i = 0; i < all.size(); i++) {
            if (all.get(i).keyword().equals("FROM")) {
                from = i;
            }
        }
        return all.subList(from, all.size());
    }

    List<Instruction> stages() {
        return all.stream().filter(i -> i.keyword().equals("FROM")).toList();
    }

    /** The arguments of the only instruction with this keyword in the final stage. */
    String only(String keyword) {
        List<String> found = finalStage().stream().filter(i -> i.keyword().equals(keyword))
                .map(Instruction::arguments).toList();
        if (found.size() != 1) {
            throw new AssertionError("expected one " + keyword + " in the final stage, found " + found);
        }
        return found.get(0);
    }

    /** The numeric user id that the final stage runs as. */
    long userId() {
        return Long.parseLong(only("USER").split(":")[0]);
    }
}
