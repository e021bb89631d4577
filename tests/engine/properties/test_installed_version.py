"""The versions Kernline reads without importing importlib.metadata (its own, for ``--version``, and
pint's, which names the unit cache) are the ones importlib.metadata gives, for every installed
distribution (Python documentation, ``importlib.metadata.version``: the first distribution found on
``sys.path``)."""

from __future__ import annotations

import importlib.metadata

import kernline.engine as engine


def test_every_installed_distribution_reads_as_importlib_metadata_reads_it():
    """Each distribution's version, looked up by its own name, equals importlib.metadata.version."""
    names = {d.metadata["Name"] for d in importlib.metadata.distributions() if d.metadata["Name"]}
    assert {"kernline", "numpy", "pint"} <= {n.lower() for n in names}
    for name in sorted(names):
        assert engine._installed_version(name) == importlib.metadata.version(name), name


def test_kernline_version_and_a_missing_distribution():
    """kernline's __version__ is its installed version; a distribution that is not installed gives None."""
    assert engine.__version__ == importlib.metadata.version("kernline")
    assert engine._installed_version("kernline-no-such-distribution") is None


def test_an_egg_earlier_on_the_path_is_read_as_importlib_metadata_reads_it(tmp_path, monkeypatch):
    """A ``kernline.egg-info`` folder (or file) before the installed one, as a source checkout holds,
    gives its own version, as it does to importlib.metadata."""
    folder = tmp_path / "checkout"
    (folder / "kernline.egg-info").mkdir(parents=True)
    (folder / "kernline.egg-info" / "PKG-INFO").write_text("Metadata-Version: 2.1\nName: kernline\nVersion: 7.1.2\n\n")
    (tmp_path / "old").mkdir()
    (tmp_path / "old" / "Pint-0.1-py3.11.egg-info").write_text("Metadata-Version: 1.0\nName: Pint\nVersion: 0.1\n\n")
    monkeypatch.syspath_prepend(str(tmp_path / "old"))
    monkeypatch.syspath_prepend(str(folder))
    assert engine._installed_version("kernline") == importlib.metadata.version("kernline") == "7.1.2"
    assert engine._installed_version("pint") == importlib.metadata.version("pint") == "0.1"
