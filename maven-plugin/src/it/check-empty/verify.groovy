def log = new File(basedir, 'build.log').text
// The first build: nothing found is a build error that says where it looked and how to allow it.
assert log.contains('mesolint: no programme file (*.yaml, *.yml) found in programmes: nothing was checked; check programmes (mesolint.programmes), includes and excludes, or set allowEmpty (mesolint.allowEmpty) when that is expected')
assert log.contains('BUILD FAILURE')
// The second build, with -Dmesolint.allowEmpty=true, says the same without failing.
assert log.contains('mesolint: no programme file (*.yaml, *.yml) found in programmes: nothing was checked (allowEmpty)')
assert log.contains('BUILD SUCCESS')
return true
