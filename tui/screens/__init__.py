"""The interface's screens: the main planning screen, the help screen and the file dialogs."""
