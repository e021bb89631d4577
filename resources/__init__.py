"""Kernline's resource files (units definitions, demo project, icons), installed as ``kernline.resources``."""
