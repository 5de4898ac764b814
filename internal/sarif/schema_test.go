package sarif

// This file holds a validator for the subset of JSON Schema draft 04
// (IETF draft-zyp-json-schema-04 and draft-fge-json-schema-validation-00)
// that the SARIF 2.1.0 schema in testdata uses: type, properties,
// required, additionalProperties, items, enum, minimum, maximum,
// minItems, uniqueItems, pattern, anyOf, oneOf and local $ref. The
// keywords format, default, description, title and id do not constrain
// an instance and are ignored, as draft 04 allows for format.

import (
	"encoding/json"
	"fmt"
	"math"
	"reflect"
	"regexp"
	"sort"
	"strings"
)

type schemaValidator struct {
	root map[string]any
}

func (v *schemaValidator) validate(schema map[string]any, inst any, path string) []string {
	if ref, ok := schema["$ref"].(string); ok {
		return v.validate(v.resolve(ref), inst, path)
	}
	var errs []string
	fail := func(format string, args ...any) {
		errs = append(errs, path+": "+fmt.Sprintf(format, args...))
	}
	if t, ok := schema["type"]; ok && !typeMatches(t, inst) {
		fail("type %v expected, got %T", t, inst)
		return errs
	}
	if enum, ok := schema["enum"].([]any); ok {
		found := false
		for _, e := range enum {
			if reflect.DeepEqual(e, inst) {
				found = true
			}
		}
		if !found {
			fail("value %v not in enum %v", inst, enum)
		}
	}
	switch x := inst.(type) {
	case map[string]any:
		errs = append(errs, v.object(schema, x, path)...)
	case []any:
		errs = append(errs, v.array(schema, x, path)...)
	case string:
		if p, ok := schema["pattern"].(string); ok && !regexp.MustCompile(p).MatchString(x) {
			fail("%q does not match %s", x, p)
		}
	case float64:
		if m, ok := schema["minimum"].(float64); ok && x < m {
			fail("%v below minimum %v", x, m)
		}
		if m, ok := schema["maximum"].(float64); ok && x > m {
			fail("%v above maximum %v", x, m)
		}
	}
	if alts, ok := schema["anyOf"].([]any); ok && v.countValid(alts, inst, path) == 0 {
		fail("matches none of anyOf")
	}
	if alts, ok := schema["oneOf"].([]any); ok {
		if n := v.countValid(alts, inst, path); n != 1 {
			fail("matches %d of oneOf, want 1", n)
		}
	}
	return errs
}

func (v *schemaValidator) countValid(alts []any, inst any, path string) int {
	n := 0
	for _, a := range alts {
		if len(v.validate(a.(map[string]any), inst, path)) == 0 {
			n++
		}
	}
	return n
}

func (v *schemaValidator) object(schema, obj map[string]any, path string) []string {
	var errs []string
	if req, ok := schema["required"].([]any); ok {
		for _, r := range req {
			if _, ok := obj[r.(string)]; !ok {
				errs = append(errs, fmt.Sprintf("%s: required property %q missing", path, r))
			}
		}
	}
	props, _ := schema["properties"].(map[string]any)
	keys := make([]string, 0, len(obj))
	for k := range obj {
		keys = append(keys, k)
	}
	sort.Strings(keys)
	for _, k := range keys {
		if ps, ok := props[k]; ok {
			errs = append(errs, v.validate(ps.(map[string]any), obj[k], path+"."+k)...)
			continue
		}
		switch ap := schema["additionalProperties"].(type) {
		case bool:
			if !ap {
				errs = append(errs, fmt.Sprintf("%s: property %q not allowed", path, k))
			}
		case map[string]any:
			errs = append(errs, v.validate(ap, obj[k], path+"."+k)...)
		}
	}
	return errs
}

func (v *schemaValidator) array(schema map[string]any, arr []any, path string) []string {
	var errs []string
	if m, ok := schema["minItems"].(float64); ok && float64(len(arr)) < m {
		errs = append(errs, fmt.Sprintf("%s: %d items, want at least %v", path, len(arr), m))
	}
	if u, ok := schema["uniqueItems"].(bool); ok && u {
		for i := range arr {
			for j := i + 1; j < len(arr); j++ {
				if reflect.DeepEqual(arr[i], arr[j]) {
					errs = append(errs, fmt.Sprintf("%s: items %d and %d equal", path, i, j))
				}
			}
		}
	}
	if items, ok := schema["items"].(map[string]any); ok {
		for i, e := range arr {
			errs = append(errs, v.validate(items, e, fmt.Sprintf("%s[%d]", path, i))...)
		}
	}
	return errs
}

func (v *schemaValidator) resolve(ref string) map[string]any {
	if !strings.HasPrefix(ref, "#/") {
		panic("non-local $ref " + ref)
	}
	var node any = v.root
	for _, part := range strings.Split(ref[2:], "/") {
		node = node.(map[string]any)[part]
	}
	return node.(map[string]any)
}

// typeMatches implements the draft 04 "type" keyword, where integer is a
// number without a fractional part.
func typeMatches(t any, inst any) bool {
	if list, ok := t.([]any); ok {
		for _, e := range list {
			if typeMatches(e, inst) {
				return true
			}
		}
		return false
	}
	switch t.(string) {
	case "object":
		_, ok := inst.(map[string]any)
		return ok
	case "array":
		_, ok := inst.([]any)
		return ok
	case "string":
		_, ok := inst.(string)
		return ok
	case "boolean":
		_, ok := inst.(bool)
		return ok
	case "null":
		return inst == nil
	case "number":
		_, ok := inst.(float64)
		return ok
	case "integer":
		f, ok := inst.(float64)
		return ok && f == math.Trunc(f)
	}
	return false
}

func newSchemaValidator(data []byte) (*schemaValidator, error) {
	var root map[string]any
	if err := json.Unmarshal(data, &root); err != nil {
		return nil, err
	}
	return &schemaValidator{root: root}, nil
}
