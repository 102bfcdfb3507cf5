"""What a route plug-in imports: placeholder filled in by the plug-in API work."""
