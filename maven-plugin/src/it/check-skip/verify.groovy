def log = new File(basedir, 'build.log').text
assert log.contains('mesolint: skipped (mesolint.skip)')
assert !log.contains('unknown-exercise')
assert log.contains('BUILD SUCCESS')
return true
