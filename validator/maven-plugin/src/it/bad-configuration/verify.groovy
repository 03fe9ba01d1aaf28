String log = new File(basedir, 'build.log').text
assert log.contains('Protolyte cannot check with this configuration:')
assert log.contains("failOn: 'fatal' is not one of error, warning, note")
assert log.contains('rule pack ' + new File(basedir, 'packs/site-pack.json').path + ': file not found')
assert log.contains('files: ' + new File(basedir, 'drafts').path + ' does not exist')
assert log.contains('BUILD FAILURE')
// nothing was checked, so no report was written
assert !new File(basedir, 'target/protolyte').exists()
return true
