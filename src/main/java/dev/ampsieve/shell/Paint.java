package dev.ampsieve.shell;

/**
 * ANSI styling for the shell's own lines (ECMA-48 SGR), or nothing at all when colours are off
 * (NO_COLOR set, a dumb terminal, or not a terminal).
 */
record Paint(boolean on) {

    String dim(String s) {
        return wrap("2", s);
    }

    String bold(String s) {
        return wrap("1", s);
    }

    String red(String s) {
        return wrap("31", s);
    }

    String green(String s) {
        return wrap("32", s);
    }

    String cyan(String s) {
        return wrap("36", s);
    }

    private String wrap(String code, String s) {
        return on && !s.isEmpty() ? "\u001b[" + code + "m" + s + "\u001b[0m" : s;
    }
}
