def log = new File(basedir, 'build.log').text
assert log.contains("[INFO] programmes/sled.yaml:16:23: waived error unknown-exercise: unknown exercise 'harbour-sled-press'")
assert log.contains("waived at line 22: the club's own sled press, described in the coaching notes")
assert log.contains('mesolint: 1 file checked: 0 errors, 0 warnings, 0 info, 1 waived')
assert log.contains('BUILD SUCCESS')
return true
