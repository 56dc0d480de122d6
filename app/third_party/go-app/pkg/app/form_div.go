package app

// FormAsDiv returns a <form> element drawn with the Div element's type
// (Fieldhead's change): the Form element's own type, its methods and their
// type data, add about 9 KB of brotli to a wasm that needs of a form only a
// class, an id, an attribute and a body.
func FormAsDiv() HTMLDiv {
	return &htmlDiv{htmlElement: htmlElement{tag: "form"}}
}
