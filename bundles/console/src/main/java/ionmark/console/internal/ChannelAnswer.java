package ionmark.console.internal;

/** What a command printed and its exit code, as the check channel carries it back to the command line. */
record ChannelAnswer(int code, String out, String err) {
}
