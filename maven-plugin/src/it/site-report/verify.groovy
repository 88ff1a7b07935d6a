def log = new File(basedir, 'build.log').text
def page = new File(basedir, 'target/site/mesolint.html')
// The coaches' page is in the site, with the finding and the caution, and the site still builds.
assert page.isFile()
assert page.text.contains('unknown-exercise')
assert page.text.contains('PAR-Q+')
assert log.contains('mesolint: 2 files checked: 1 error, 0 warnings, 0 info, 0 waived -> FAILED (fail level: error)')
assert log.contains('BUILD SUCCESS')
// The site lists it under Project Reports, linked by its output name.
def reports = new File(basedir, 'target/site/project-reports.html').text
assert reports.contains('href="mesolint.html"')
assert reports.contains('Training programmes checked by mesolint')
return true
