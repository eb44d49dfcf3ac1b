"use strict";
for (const id of ["to-supervisor", "to-team"]) document.getElementById(id).search = location.search;
