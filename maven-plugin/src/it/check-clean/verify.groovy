def log = new File(basedir, 'build.log').text
assert log.contains('mesolint: Note: mesolint applies general, population-level training guidance')
assert log.contains('mesolint: 1 file checked: 0 errors, 0 warnings, 0 info, 0 waived')
assert log.contains('BUILD SUCCESS')
assert new File(basedir, 'target/mesolint/cache.json').isFile()
return true
